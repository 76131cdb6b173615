/**
 * One colour per budget term, the same in every figure of every notebook.
 * Okabe & Ito's colour-blind-safe palette (2008, "Color Universal Design");
 * the legend always names each term, so colour is never the only cue.
 */
export const BUDGET_COLOURS = {
  advection: '#0072B2',
  diffusion: '#56B4E9',
  biology: '#009E73',
  'air–sea flux': '#E69F00',
  tendency: '#1d2326',
  residual: '#CC79A7',
} as const;

/** The canonical budget terms, in legend order. */
export type BudgetTermName = keyof typeof BUDGET_COLOURS;

// Terms named otherwise still keep one colour: chosen from the rest of the palette by their name.
const SPARE = ['#D55E00', '#8c6d1f', '#5e3c99', '#4d4d4d', '#a6761d', '#1b7837'];

const ALIASES: Record<string, BudgetTermName> = {
  advection: 'advection',
  'horizontal advection': 'advection',
  'vertical advection': 'advection',
  transport: 'advection',
  diffusion: 'diffusion',
  mixing: 'diffusion',
  'vertical mixing': 'diffusion',
  biology: 'biology',
  biological: 'biology',
  'biological pump': 'biology',
  'air-sea flux': 'air–sea flux',
  'air–sea flux': 'air–sea flux',
  'air sea flux': 'air–sea flux',
  'air-sea': 'air–sea flux',
  'gas exchange': 'air–sea flux',
  tendency: 'tendency',
  residual: 'residual',
};

/** The canonical term a name stands for, if any ("Air-sea flux" → "air–sea flux"). */
export function canonicalTerm(name: string): BudgetTermName | null {
  return ALIASES[name.trim().toLowerCase().replace(/\s+/g, ' ')] ?? null;
}

/** The colour of a budget term by its name. */
export function budgetColour(name: string): string {
  const canonical = canonicalTerm(name);
  if (canonical) return BUDGET_COLOURS[canonical];
  let h = 0;
  for (const ch of name.trim().toLowerCase()) h = (h * 31 + ch.charCodeAt(0)) >>> 0;
  return SPARE[h % SPARE.length];
}
