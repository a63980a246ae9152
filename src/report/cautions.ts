// The cautions printed with every result: springs store energy and fail in fatigue.
export const CAUTIONS: readonly string[] = [
  'coilfront computes from published formulas and catalog data, some of it marked "from memory": verify material figures and tolerances with your spring supplier.',
  'Build and test prototypes under the real load cycle, temperature and environment before release.',
  'For safety-critical uses follow the applicable codes and standards and licensed engineering practice; a compressed spring stores energy and can release it violently.',
];

export function cautionText(): string {
  return ['Cautions:', ...CAUTIONS.map((c) => `  - ${c}`)].join('\n');
}
