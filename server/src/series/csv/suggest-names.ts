/** Unit words that end column names in carbon and climate exports (`dic_0_100m_PgC`), matched case-sensitively. */
const UNIT_SUFFIXES = new Set([
  'PgC', 'TgC', 'GtC', 'GgC', 'PgCyr', 'PgC/yr', 'TgC/yr', 'molC', 'mol', 'mmol', 'umol', 'µmol',
  'degC', 'K', 'ppm', 'uatm', 'µatm', 'umolkg', 'mmolm3', 'molm2yr', 'gCm2yr',
]);

/** A name and units guessed from a column header: `sst (degC)`, `sst [degC]` and `dic_PgC` all carry units. */
export function suggestFromHeader(header: string): { name: string; units?: string } {
  const bracketed = /^(.*?)\s*[([]\s*([^()[\]]+?)\s*[)\]]\s*$/.exec(header);
  if (bracketed && bracketed[1] !== '') return { name: bracketed[1], units: bracketed[2] };
  const parts = header.split('_');
  const last = parts[parts.length - 1];
  if (parts.length > 1 && UNIT_SUFFIXES.has(last)) return { name: parts.slice(0, -1).join('_'), units: last };
  return { name: header };
}

/** A name for the one series of a wide table: the file name without its extension, else `series`. */
export function suggestFromFileName(fileName: string | undefined): string {
  const base = (fileName ?? '').split(/[\\/]/).pop() ?? '';
  const stem = base.replace(/\.(csv|tsv|txt|dat|data|asc)$/i, '').trim();
  return stem === '' ? 'series' : stem;
}
