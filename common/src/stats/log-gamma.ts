// Lanczos coefficients for g = 607/128 with 14 terms: Press, Teukolsky, Vetterling & Flannery,
// Numerical Recipes, 3rd ed. (2007), §6.1, routine gammln; relative error below 1e-15 for x > 0.
const COF = [
  57.1562356658629235, -59.5979603554754912, 14.1360979747417471, -0.491913816097620199,
  0.339946499848118887e-4, 0.465236289270485756e-4, -0.983744753048795646e-4, 0.158088703224912494e-3,
  -0.210264441724104883e-3, 0.217439618115212643e-3, -0.164318106536763890e-3, 0.844182239838527433e-4,
  -0.261908384015814087e-4, 0.368991826595316234e-5,
];

/** ln Γ(x) for x > 0 (Lanczos approximation, Numerical Recipes 3rd ed. §6.1); NaN for x ≤ 0. */
export function logGamma(x: number): number {
  if (!(x > 0)) return NaN;
  let y = x;
  let tmp = x + 5.2421875;
  tmp = (x + 0.5) * Math.log(tmp) - tmp;
  let ser = 0.999999999999997092;
  for (let j = 0; j < 14; j++) ser += COF[j] / ++y;
  return tmp + Math.log((2.5066282746310005 * ser) / x);
}
