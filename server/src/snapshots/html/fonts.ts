import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';

/** The typefaces of the design (documents, interface, values), latin subset, as the web loads them. */
const FACES = [
  { family: 'Merriweather', pkg: '@fontsource/merriweather', file: 'merriweather-latin-400-normal.woff2', weight: 400, style: 'normal' },
  { family: 'Merriweather', pkg: '@fontsource/merriweather', file: 'merriweather-latin-400-italic.woff2', weight: 400, style: 'italic' },
  { family: 'Merriweather', pkg: '@fontsource/merriweather', file: 'merriweather-latin-700-normal.woff2', weight: 700, style: 'normal' },
  { family: 'Source Sans 3', pkg: '@fontsource/source-sans-3', file: 'source-sans-3-latin-400-normal.woff2', weight: 400, style: 'normal' },
  { family: 'Source Sans 3', pkg: '@fontsource/source-sans-3', file: 'source-sans-3-latin-600-normal.woff2', weight: 600, style: 'normal' },
  { family: 'IBM Plex Mono', pkg: '@fontsource/ibm-plex-mono', file: 'ibm-plex-mono-latin-400-normal.woff2', weight: 400, style: 'normal' },
] as const;

let css: string | undefined;

/** @font-face rules with every font inlined as a base64 woff2 data: URI, so the file opens offline. */
export function inlineFontFaces(): string {
  css ??= FACES.map((f) => {
    const dir = dirname(require.resolve(`${f.pkg}/package.json`));
    const data = readFileSync(join(dir, 'files', f.file)).toString('base64');
    return `@font-face{font-family:'${f.family}';font-style:${f.style};font-weight:${f.weight};font-display:swap;src:url(data:font/woff2;base64,${data}) format('woff2');}`;
  }).join('\n');
  return css;
}
