// The mixed-discrete coil compression spring problem of the design-optimisation literature:
// E. Sandgren, "Nonlinear integer and discrete programming in mechanical design optimization",
// ASME J. Mechanical Design 112 (1990) 223-229; as restated by J. Lampinen and I. Zelinka (1999),
// S. Datta and J. R. Figueira, Applied Soft Computing 11 (2011), Table 6, and the CEC2020 real-world
// constrained suite (Kumar et al. 2020), problem RC30. Best known f = 2.658559 at N = 9, d = 0.283 in,
// D = 1.223041 in. Units: inches, pounds, psi.
import { TREND, type Problem } from '../../src/search/problem.js';
import { wahlFactor } from '../../src/model/stressFactor.js';

export const SANDGREN_WIRE_SIZES = [
  0.009, 0.0095, 0.0104, 0.0118, 0.0128, 0.0132, 0.014, 0.015, 0.0162, 0.0173, 0.018, 0.02, 0.023, 0.025, 0.028, 0.032, 0.035, 0.041, 0.047, 0.054, 0.063,
  0.072, 0.08, 0.092, 0.105, 0.12, 0.135, 0.148, 0.162, 0.177, 0.192, 0.207, 0.225, 0.244, 0.263, 0.283, 0.307, 0.331, 0.362, 0.394, 0.4375, 0.5,
];

export const SANDGREN_BEST_KNOWN = 2.658559;

const Fmax = 1000;
const S = 189000;
const lmax = 14;
const dmin = 0.2;
const Dmax = 3.0;
const Fp = 300;
const dpm = 6.0;
const dw = 1.25;
const G = 11.5e6;

export function sandgrenProblem(): Problem {
  const inc = TREND.increasing;
  const dec = TREND.decreasing;
  return {
    name: 'Sandgren mixed-discrete coil compression spring',
    // Variables in the order the grid walks them: wire (list), coils (integer), mean diameter (solved).
    variables: [
      { kind: 'list', name: 'd', values: SANDGREN_WIRE_SIZES },
      { kind: 'range', name: 'N', min: 1, max: 70, step: 1 },
      { kind: 'continuous', name: 'D', min: 0.6, max: 3, resolution: 1e-4, solve: true },
    ],
    constraintNames: [
      'g1 stress',
      'g2 free length',
      'g3 min wire',
      'g4 max coil',
      'g5 index',
      'g6 preload deflection',
      'g7 consistency',
      'g8 working deflection',
    ],
    objectiveNames: ['volume'],
    constraintTrend: Int8Array.from([inc, inc, inc, inc, dec, inc, inc, dec]),
    objectiveTrend: Int8Array.from([inc]),
    // The volume at the smallest coil diameter grows with the coil count N.
    boundGrowsAlong: 1,
    evaluate(x, g, f) {
      const d = x[0];
      const N = x[1];
      const D = x[2];
      const C = D / d;
      const Cf = wahlFactor(C);
      const K = (G * d * d * d * d) / (8 * N * D * D * D);
      const dp = Fp / K;
      const lf = Fmax / K + 1.05 * (N + 2) * d;
      g[0] = ((8 * Cf * Fmax * D) / (Math.PI * d * d * d) - S) / S;
      g[1] = (lf - lmax) / lmax;
      g[2] = (dmin - d) / dmin;
      g[3] = (D - Dmax) / Dmax;
      g[4] = (3 - C) / 3;
      g[5] = (dp - dpm) / dpm;
      g[6] = (dp + (Fmax - Fp) / K + 1.05 * (N + 2) * d - lf) / lmax;
      g[7] = (dw - (Fmax - Fp) / K) / dw;
      f[0] = (Math.PI * Math.PI * D * d * d * (N + 2)) / 4;
    },
  };
}
