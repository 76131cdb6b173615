import { logBeta } from './log-beta';

const EPS = 1e-16;
const FPMIN = 1e-300;
const MAXIT = 10000;

/**
 * Regularized incomplete beta function I_x(a, b), a, b > 0, 0 ≤ x ≤ 1.
 * Continued fraction evaluated by the modified Lentz method (Lentz 1976, Applied Optics 15:668;
 * Thompson & Barnett 1986, J. Comput. Phys. 64:490), as in Numerical Recipes 3rd ed. §6.4 (betai,
 * betacf), using the symmetry I_x(a,b) = 1 − I_{1−x}(b,a) where the fraction converges faster.
 * `oneMinusX` may be passed when the caller knows 1 − x more precisely than by subtraction.
 */
export function incompleteBeta(a: number, b: number, x: number, oneMinusX: number = 1 - x): number {
  if (!(a > 0) || !(b > 0) || !(x >= 0) || !(x <= 1)) return NaN;
  if (x === 0) return 0;
  if (oneMinusX === 0) return 1;
  // ln x and ln(1 − x) through log1p of the smaller side, so neither loses digits near 1.
  const lnX = x < 0.5 ? Math.log(x) : Math.log1p(-oneMinusX);
  const lnOneMinusX = oneMinusX < 0.5 ? Math.log(oneMinusX) : Math.log1p(-x);
  const lnFront = a * lnX + b * lnOneMinusX - logBeta(a, b);
  const front = Math.exp(lnFront);
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(a, b, x)) / a;
  return 1 - (front * betaContinuedFraction(b, a, oneMinusX)) / b;
}

/** Complement 1 − I_x(a, b) = I_{1−x}(b, a), accurate when I_x(a, b) is close to 1. */
export function incompleteBetaComplement(a: number, b: number, x: number, oneMinusX: number = 1 - x): number {
  return incompleteBeta(b, a, oneMinusX, x);
}

/** Continued fraction for I_x(a,b) (NR 3rd ed. eq. 6.4.5), modified Lentz evaluation. */
function betaContinuedFraction(a: number, b: number, x: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < FPMIN) d = FPMIN;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAXIT; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < FPMIN) d = FPMIN;
    c = 1 + aa / c;
    if (Math.abs(c) < FPMIN) c = FPMIN;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < FPMIN) d = FPMIN;
    c = 1 + aa / c;
    if (Math.abs(c) < FPMIN) c = FPMIN;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) <= EPS) break;
  }
  return h;
}
