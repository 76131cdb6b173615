/** NIST StRD univariate data sets with their certified values, for the engine's tests. */
import { fixtureNumbers } from './read-fixture';

/** One NIST StRD univariate case: data and certified mean, sd (n − 1), lag-1 autocorrelation. */
export interface NistUnivariate {
  name: string;
  data: number[];
  mean: number;
  sd: number;
  r1: number;
  /** Relative tolerances for mean, sd, r1 (NIST's difficulty ranks; representation error of the decimals). */
  tol: [number, number, number];
}

/** NumAcc2–4 follow NIST's construction: one centre value, then 500 pairs centre ∓ 0.1. */
function numAcc(centre: number): number[] {
  const out = [centre];
  for (let i = 0; i < 500; i++) out.push(centre - 0.1, centre + 0.1);
  return out.map((v) => Number(v.toPrecision(9)));
}

/** The cases, certified values from itl.nist.gov/div898/strd/univ (see test-fixtures/README.md). */
export const NIST_UNIVARIATE: NistUnivariate[] = [
  { name: 'Lew', data: fixtureNumbers('nist-lew.txt'), mean: -177.435, sd: 277.332168044316, r1: -0.307304800605679, tol: [1e-14, 1e-14, 1e-13] },
  { name: 'Michelso', data: fixtureNumbers('nist-michelso.txt'), mean: 299.8524, sd: 0.0790105478190518, r1: 0.535199668621283, tol: [1e-14, 1e-12, 1e-11] },
  { name: 'NumAcc1', data: [10000001, 10000003, 10000002], mean: 10000002, sd: 1, r1: -0.5, tol: [1e-15, 1e-15, 1e-15] },
  { name: 'NumAcc2', data: numAcc(1.2), mean: 1.2, sd: 0.1, r1: -0.999, tol: [1e-14, 1e-13, 1e-12] },
  { name: 'NumAcc3', data: numAcc(1000000.2), mean: 1000000.2, sd: 0.1, r1: -0.999, tol: [1e-14, 1e-8, 1e-8] },
  { name: 'NumAcc4', data: numAcc(10000000.2), mean: 10000000.2, sd: 0.1, r1: -0.999, tol: [1e-14, 1e-7, 1e-7] },
];
