/**
 * Text made safe to place in HTML text or a quoted attribute: the five characters of the OWASP XSS Prevention Cheat
 * Sheet's rule 1. The one escaper of the server (snapshot HTML files, mail bodies).
 */
export function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}
