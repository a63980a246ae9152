// source: none needed; nothing here is checked against a value from outside the project.
// No outside values here: the expected outputs are coilfront's own, recorded before the seam
// restructuring (issue 7) so that every later commit can prove it changed no output byte.
/** `output`: the case writes a file (its path is '{out}' in args) and the file is what is recorded. */
export interface GoldenCase {
  name: string;
  args: string[];
  output?: boolean;
}

const demo = 'examples/washer-trigger.yaml';
const dispenser = 'examples/stock-dispenser.yaml';
const shutter = 'test/golden/inputs/shutter-lift.yaml';
const clip = 'test/golden/inputs/cramped-clip.yaml';
const pedalBin = 'examples/extension-pedal-bin.yaml';

export const GOLDEN_CASES: GoldenCase[] = [
  { name: 'design-washer-trigger.txt', args: ['design', demo] },
  { name: 'design-washer-trigger.json', args: ['design', demo, '--json'] },
  { name: 'design-washer-trigger-us.txt', args: ['design', demo, '--units', 'us', '--per-wire'] },
  { name: 'design-stock-dispenser.txt', args: ['design', dispenser] },
  { name: 'design-stock-dispenser.json', args: ['design', dispenser, '--json'] },
  { name: 'design-shutter-lift.txt', args: ['design', shutter] },
  { name: 'design-shutter-lift.json', args: ['design', shutter, '--json'] },
  { name: 'design-cramped-clip.txt', args: ['design', clip] },
  { name: 'design-cramped-clip.json', args: ['design', clip, '--json'] },
  { name: 'analyze-valve-return-spring.txt', args: ['analyze', 'examples/valve-return-spring.yaml'] },
  { name: 'analyze-valve-return-spring.json', args: ['analyze', 'examples/valve-return-spring.yaml', '--json'] },
  { name: 'frontier-washer-trigger.csv', args: ['frontier', demo] },
  { name: 'frontier-washer-trigger-cost.json', args: ['frontier', demo, '--x', 'relative_cost', '--y', 'free_length', '--json'] },
  { name: 'sweep-washer-trigger.csv', args: ['sweep', demo, '--vary', 'envelope.max_outer_diameter=12:16:2'] },
  { name: 'design-washer-trigger.html', args: ['design', demo, '--report', '{out}'], output: true },
  { name: 'design-washer-trigger-us.html', args: ['design', demo, '--units', 'us', '--report', '{out}'], output: true },
  { name: 'design-extension-pedal-bin.txt', args: ['design', pedalBin] },
  { name: 'design-extension-pedal-bin.json', args: ['design', pedalBin, '--json'] },
  { name: 'design-washer-trigger-spec.html', args: ['design', demo, '--spec', '{out}'], output: true },
  { name: 'design-extension-pedal-bin-spec.html', args: ['design', pedalBin, '--spec', '{out}'], output: true },
  {
    name: 'analyze-extension-pedal-bin-spring-spec-us.html',
    args: ['analyze', 'examples/extension-pedal-bin-spring.yaml', '--units', 'us', '--spec', '{out}'],
    output: true,
  },
];
