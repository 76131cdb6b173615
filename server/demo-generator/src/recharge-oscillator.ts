import type { RandomStream } from './random-stream';

/**
 * Parameters of the stochastic recharge oscillator, time in months. T is the eastern equatorial
 * SST anomaly (°C), h the western thermocline-depth (warm-water volume) anomaly (m).
 */
export interface RechargeOscillatorParams {
  /** Mean growth rate of T, per month (negative: damped on average). */
  growthMean: number;
  /** Amplitude of the seasonal modulation of the growth rate, per month. */
  growthSeasonal: number;
  /** Calendar time (fraction of a year, 0 = 1 January) at which the growth rate is largest. */
  growthPeakPhase: number;
  /** Thermocline feedback F1: warming of T per metre of h, °C m⁻¹ month⁻¹. */
  thermoclineFeedback: number;
  /** Recharge coupling F2: discharge of h per °C of T, m °C⁻¹ month⁻¹. */
  rechargeCoupling: number;
  /** Damping ε of h, per month. */
  thermoclineDamping: number;
  /** Noise amplitude σT of T, °C month^-½. */
  noiseT: number;
  /** Noise amplitude σh of h, m month^-½. */
  noiseH: number;
  /** State-dependent (multiplicative) noise B: σT is scaled by (1 + B·T), per °C, floored at 0. */
  multiplicativeNoise: number;
  /** Nonlinear heating a: adds a·T² to dT/dt, °C⁻¹ month⁻¹ (warm events grow faster). */
  nonlinearHeating: number;
  /** Cubic damping c: adds −c·T³ to dT/dt, °C⁻² month⁻¹ (keeps the quadratic term bounded). */
  cubicDamping: number;
  /** Euler–Maruyama steps per month. */
  stepsPerMonth: number;
  /** Months simulated and thrown away before the first month kept, so the start is forgotten. */
  spinUpMonths: number;
}

/**
 * The demo's values, chosen (not fitted) so that the index has a 3–5-year period, an anomaly sd
 * near 0.9 °C, events locked to the season (growth largest in boreal late summer, peaks near the
 * turn of the year) and warm events stronger than cold ones (positive skewness). For the linear part the complex
 * eigenvalues of [[R0, F1], [−F2, −ε]] give a decay of (R0 − ε)/2 = −0.03 per month and a
 * frequency √(F1·F2 − ((R0 + ε)/2)²) ≈ 2π/47 per month.
 */
export const DEMO_OSCILLATOR: RechargeOscillatorParams = {
  growthMean: -0.02,
  growthSeasonal: 0.07,
  growthPeakPhase: 8.5 / 12,
  thermoclineFeedback: 0.01,
  rechargeCoupling: 1.8,
  thermoclineDamping: 0.04,
  noiseT: 0.13,
  noiseH: 3.6,
  multiplicativeNoise: 0.4,
  nonlinearHeating: 0.02,
  cubicDamping: 0.004,
  stepsPerMonth: 30,
  spinUpMonths: 120,
};

/** Monthly means of T (°C) and h (m) for `months` months starting in January. */
export interface OscillatorRun {
  sst: Float64Array;
  thermocline: Float64Array;
}

/**
 * Integrates the recharge oscillator of Jin (1997), "An equatorial ocean recharge paradigm for
 * ENSO. Part I: Conceptual model", J. Atmos. Sci. 54, 811–829, in its stochastically forced form
 * with a seasonally varying growth rate (as in Burgers, Jin & van Oldenborgh 2005, GRL 32, L13706,
 * and Levine & Jin 2010, J. Atmos. Sci. 67, 529–542 — forms from memory):
 *   dT/dt = R(t)·T + a·T² − c·T³ + F1·h + σT·(1 + B·T)·ξT,   dh/dt = −ε·h − F2·T + σh·ξh,
 *   R(t) = R0 + Ra·cos(2π(t − phase)), t in years.
 * The (1 + B·T) factor is state-dependent noise (Jin, Lin, Timmermann & Zhao 2007, GRL 34, L03807,
 * from memory): westerly bursts come more often in warm states. The small a·T² term stands for
 * nonlinear dynamical heating (An & Jin 2004, J. Climate 17, 2399–2412, from memory), which makes
 * warm events the stronger ones (positive skewness); −c·T³ keeps it bounded. Euler–Maruyama with `stepsPerMonth`
 * steps of one month's 1/stepsPerMonth (Kloeden & Platen 1992, §9.1): each step draws ξT then ξh.
 * The run starts at rest, `spinUpMonths` before the first month kept.
 */
export function runRechargeOscillator(random: RandomStream, months: number, p: RechargeOscillatorParams = DEMO_OSCILLATOR): OscillatorRun {
  const dt = 1 / p.stepsPerMonth;
  const sqrtDt = Math.sqrt(dt);
  const sst = new Float64Array(months);
  const thermocline = new Float64Array(months);
  let t = 0;
  let h = 0;
  for (let m = -p.spinUpMonths; m < months; m++) {
    let sumT = 0;
    let sumH = 0;
    for (let k = 0; k < p.stepsPerMonth; k++) {
      // Month m = 0 is January; the calendar time is taken at the start of the step.
      const years = (m + k * dt) / 12;
      const growth = p.growthMean + p.growthSeasonal * Math.cos(2 * Math.PI * (years - p.growthPeakPhase));
      const xiT = random.gaussian();
      const xiH = random.gaussian();
      const noiseScale = Math.max(0, 1 + p.multiplicativeNoise * t);
      const nextT = t + (growth * t + p.nonlinearHeating * t * t - p.cubicDamping * t * t * t + p.thermoclineFeedback * h) * dt + p.noiseT * noiseScale * sqrtDt * xiT;
      const nextH = h + (-p.thermoclineDamping * h - p.rechargeCoupling * t) * dt + p.noiseH * sqrtDt * xiH;
      t = nextT;
      h = nextH;
      sumT += t;
      sumH += h;
    }
    if (m >= 0) {
      sst[m] = sumT / p.stepsPerMonth;
      thermocline[m] = sumH / p.stepsPerMonth;
    }
  }
  return { sst, thermocline };
}
