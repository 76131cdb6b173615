/** The snapshot file's own stylesheet: the document's measure on paper white, and a print layout. */
export const SNAPSHOT_CSS = `
:root{--ink:#1d2326;--muted:#5b6266;--rule:#ddd8cc;--accent:#0f5e5c;--paper:#fdfcf8}
*{box-sizing:border-box}
body{margin:0;background:var(--paper);color:var(--ink);font:16px/1.7 'Merriweather',Georgia,serif}
main{max-width:44rem;margin:0 auto;padding:2.5rem 1.5rem 4rem}
header.snapshot{font-family:'Source Sans 3',system-ui,sans-serif;border-bottom:1px solid var(--rule);margin-bottom:2rem;padding-bottom:1rem}
header.snapshot .notebook{font-size:.95rem;color:var(--muted);margin:0}
header.snapshot h1{font-family:'Merriweather',Georgia,serif;font-size:1.6rem;line-height:1.3;margin:.25rem 0 .5rem}
header.snapshot dl{display:grid;grid-template-columns:max-content 1fr;gap:.15rem 1rem;margin:.75rem 0;font-size:.95rem}
header.snapshot dt{color:var(--muted)}
header.snapshot dd{margin:0}
.release-note{white-space:pre-wrap}
.notice{border-left:3px solid var(--accent);padding:.4rem .8rem;margin:.5rem 0;background:#f1f6f5;font-size:.95rem}
h1,h2,h3,h4{line-height:1.3}
a{color:var(--accent)}
code,.value,.provenance{font-family:'IBM Plex Mono',ui-monospace,monospace}
code{font-size:.9em}
pre{white-space:pre-wrap;background:#f4f2ec;padding:.75rem}
blockquote{border-left:3px solid var(--rule);margin-left:0;padding-left:1rem;color:var(--muted)}
table{border-collapse:collapse;width:100%;font-family:'Source Sans 3',system-ui,sans-serif}
th,td{border:1px solid var(--rule);padding:.3rem .5rem;vertical-align:top;text-align:left}
figure.live-figure{margin:2rem 0;break-inside:avoid}
figure.live-figure img{display:block;max-width:100%;height:auto;background:#fff}
figcaption{font-family:'Source Sans 3',system-ui,sans-serif;font-size:.95rem;margin-top:.5rem}
figcaption .methods,figcaption .cautions{color:var(--muted)}
.provenance{font-size:.78rem;color:var(--muted);padding-left:1.2rem;overflow-wrap:anywhere}
.figure-error{color:#8a1c1c}
.live-number{font-family:'IBM Plex Mono',ui-monospace,monospace;font-size:.92em}
@media print{body{background:#fff;font-size:11pt}main{max-width:none;padding:0}a{color:inherit}.notice{background:none}}
`;
