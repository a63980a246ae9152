// The continuous minimum-weight tension/compression spring problem, commonly attributed to
// A. D. Belegundu (1982) and J. S. Arora (1989); CEC2020 real-world constrained suite (Kumar et al.,
// Swarm and Evolutionary Computation 56 (2020) 100693), problem RC17. Best known f = 0.0126652328 at
// d = 0.0516890527, D = 0.3567175387, N = 11.2889775386 (g1 and g2 active).
import { TREND, type Problem } from '../../src/search/problem.js';

export const TENSION_COMPRESSION_BEST_KNOWN = 0.0126652328;

export function tensionCompressionProblem(resolution = 0.001): Problem {
  const inc = TREND.increasing;
  const dec = TREND.decreasing;
  return {
    name: 'tension/compression spring (minimum weight)',
    variables: [
      { kind: 'continuous', name: 'd', min: 0.05, max: 2, resolution },
      { kind: 'continuous', name: 'N', min: 2, max: 15, resolution: 50 * resolution },
      { kind: 'continuous', name: 'D', min: 0.25, max: 1.3, resolution: 1e-4, solve: true },
    ],
    constraintNames: ['g1 deflection', 'g2 shear stress', 'g3 surge', 'g4 outside diameter'],
    objectiveNames: ['weight'],
    // In the solved mean diameter D: g1 falls, g2, g3 and g4 rise.
    constraintTrend: Int8Array.from([dec, inc, inc, inc]),
    objectiveTrend: Int8Array.from([inc]),
    evaluate(x, g, f) {
      const d = x[0];
      const N = x[1];
      const D = x[2];
      g[0] = 1 - (D * D * D * N) / (71785 * d * d * d * d);
      g[1] = (4 * D * D - d * D) / (12566 * (D * d * d * d - d * d * d * d)) + 1 / (5108 * d * d) - 1;
      g[2] = 1 - (140.45 * d) / (D * D * N);
      g[3] = (d + D) / 1.5 - 1;
      f[0] = d * d * D * (N + 2);
    },
  };
}
