// source: none needed; nothing here is checked against a value from outside the project.
// The standing bad-input battery, as data: each row is one bad input (a whole file, a field of a spring
// or requirements file, or a command-line option), the exit code it must give and the field (or option,
// or file) its one message must name. test/cli/battery.test.ts runs every row through the CLI in-process
// and checks the rest of the contract: one line on stderr, nothing on stdout, no stack trace, no NaN,
// Infinity or undefined, nothing written. No outside values: the inputs are our own demo scenarios.
import { stringify } from 'yaml';

export type Command = 'analyze' | 'design' | 'frontier' | 'sweep';

export interface BadCase {
  /** What is wrong, as the test title. */
  name: string;
  command: Command;
  /** The input file: text (YAML or JSON), raw bytes, or an existing path; default the command's good file. */
  file?: { text?: string; bytes?: Uint8Array; ext?: string; path?: string };
  /** Options after the file. `{dir}` is a fresh empty folder for output files; `{input}` the input file. */
  args?: string[];
  /** Files created in `{dir}` before the run (they must be left untouched). */
  existing?: string[];
  code: number;
  /** Text the message must contain: the field, option or file at fault. */
  field: string;
}

// ---- the good files every field case starts from (our own scenarios) ----------------------------------

/** A spring to analyse: the valve-return spring of the demo, with working lengths. */
export const GOOD_SPRING: Record<string, unknown> = {
  units: 'si',
  material: 'stainless-302',
  wire_diameter: 1.0,
  outer_diameter: 9.0,
  active_coils: 8,
  ends: 'squared-ground',
  free_length: 30,
  seating: 'fixed-fixed',
  lengths: [22, 16],
  cycles: 2e6,
  peened: false,
  fatigue_criterion: 'gerber',
  temperature: 95,
};

/** Requirements to design from: the washer-trigger demo. */
export const GOOD_REQUIREMENTS: Record<string, unknown> = {
  units: 'si',
  material: 'stainless-302',
  ends: 'squared-ground',
  seating: 'fixed-fixed',
  load: { force: 20, length: 35 },
  operating_length: 25,
  operating_force: 32,
  load_tolerance: '5%',
  envelope: { max_outer_diameter: 16, min_inner_diameter: 6.5, max_free_length: 60 },
  cycles: 5e5,
  peened: false,
  temperature: 40,
  wire_sizes: 'metric',
  active_coils: [3, 30],
  coil_step: 0.25,
  index: [4, 12],
  rank: 'mass',
  top: 10,
  seed: 1,
};

const DELETE = Symbol('delete');

/** The document with dotted-path changes applied (DELETE removes the field). */
export function changed(base: Record<string, unknown>, change: Record<string, unknown>): Record<string, unknown> {
  const doc = structuredClone(base);
  for (const [path, value] of Object.entries(change)) {
    const keys = path.split('.');
    let node = doc as Record<string, unknown>;
    for (const k of keys.slice(0, -1)) node = (node[k] ??= {}) as Record<string, unknown>;
    if (value === DELETE) delete node[keys[keys.length - 1]];
    else node[keys[keys.length - 1]] = value;
  }
  return doc;
}

const yamlOf = (doc: unknown) => stringify(doc);
const spring = (change: Record<string, unknown>) => ({ text: yamlOf(changed(GOOD_SPRING, change)) });
const requirements = (change: Record<string, unknown>) => ({ text: yamlOf(changed(GOOD_REQUIREMENTS, change)) });

/** A spring-file field case (analyze). */
const S = (name: string, change: Record<string, unknown>, field: string): BadCase => ({
  name: `spring: ${name}`,
  command: 'analyze',
  file: spring(change),
  code: 2,
  field,
});
/** A requirements-file field case (design). */
const R = (name: string, change: Record<string, unknown>, field: string): BadCase => ({
  name: `requirements: ${name}`,
  command: 'design',
  file: requirements(change),
  code: 2,
  field,
});
/** A command-line case on the good requirements. */
const O = (name: string, command: Command, args: string[], field: string, existing?: string[]): BadCase => ({
  name: `${command} ${name}`,
  command,
  args,
  code: 2,
  field,
  existing,
});

// ---- whole files -------------------------------------------------------------------------------------

const utf8 = (s: string) => new TextEncoder().encode(s);
const concat = (...parts: Uint8Array[]) => {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
};
function utf16(text: string, bigEndian: boolean, bom: boolean): Uint8Array {
  const out: number[] = bom ? (bigEndian ? [0xfe, 0xff] : [0xff, 0xfe]) : [];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (bigEndian) out.push(c >> 8, c & 0xff);
    else out.push(c & 0xff, c >> 8);
  }
  return new Uint8Array(out);
}
const goodSpringYaml = yamlOf(GOOD_SPRING);
const goodReqYaml = yamlOf(GOOD_REQUIREMENTS);

/** An alias bomb: each level lists the one before ten times (10^9 leaves if expanded). */
const aliasBomb =
  [
    'a: &a ["lol","lol","lol","lol","lol","lol","lol","lol","lol","lol"]',
    ...'bcdefghi'.split('').map((k, i) => {
      const prev = 'abcdefghi'[i];
      return `${k}: &${k} [${Array(10).fill(`*${prev}`).join(',')}]`;
    }),
  ].join('\n') + '\n';

function wholeFiles(command: 'analyze' | 'design', good: string): BadCase[] {
  const C = (name: string, file: BadCase['file'], field: string): BadCase => ({ name: `${command} file: ${name}`, command, file, code: 2, field });
  const firstKey = command === 'analyze' ? 'units' : 'units';
  return [
    C('empty', { text: '' }, 'the file is empty'),
    C('only blank lines', { text: '\n\n   \n' }, 'the file is empty'),
    C('only a comment', { text: '# nothing here\n' }, 'the file is empty'),
    C('empty JSON object', { text: '{}', ext: 'json' }, 'material'),
    C('binary bytes', { bytes: new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]) }, 'NUL byte'),
    C('random binary', { bytes: new Uint8Array(Array.from({ length: 512 }, (_, i) => (i * 73 + 11) % 256)) }, 'UTF-8'),
    C(
      'invalid UTF-8 in a value',
      { bytes: concat(utf8('units: si\nmaterial: stainless-302\nends: "squared'), new Uint8Array([0xc3, 0x28]), utf8('"\n')) },
      'line 3',
    ),
    C('a lone continuation byte', { bytes: concat(utf8(good), new Uint8Array([0x80]), utf8('\n')) }, 'invalid UTF-8'),
    C('an overlong encoding', { bytes: concat(utf8('units: si\n'), new Uint8Array([0xc0, 0xaf]), utf8('\n')) }, 'line 2'),
    C('UTF-16 LE with a byte-order mark', { bytes: utf16(good, false, true) }, 'UTF-16'),
    C('UTF-16 BE with a byte-order mark', { bytes: utf16(good, true, true) }, 'UTF-16'),
    C('UTF-16 LE without a byte-order mark', { bytes: utf16(good, false, false) }, 'NUL byte'),
    C('a UTF-8 byte-order mark before a bad field', { bytes: concat(new Uint8Array([0xef, 0xbb, 0xbf]), utf8(good + 'colour: red\n')) }, 'colour'),
    C('deep flow nesting', { text: `${firstKey}: ${'['.repeat(5000)}${']'.repeat(5000)}\n` }, 'nesting'),
    C('deep block nesting', { text: Array.from({ length: 60 }, (_, i) => `${'  '.repeat(i)}k${i}:`).join('\n') + ' 1\n' }, 'levels of nesting'),
    C('deep JSON nesting', { text: `{"units": ${'['.repeat(5000)}${']'.repeat(5000)}}`, ext: 'json' }, 'nesting'),
    C('an alias bomb', { text: good + aliasBomb }, 'alias'),
    C('an alias to no anchor', { text: good + 'extra: *nothing\n' }, 'no &nothing'),
    C('a repeated top-level key (YAML)', { text: good + 'units: us\n' }, 'units is repeated'),
    C(
      'a repeated nested key (YAML)',
      {
        text:
          command === 'design'
            ? good + 'safety:\n  static: 1.2\n  static: 1.5\n'
            : good.replace('material: stainless-302', 'material:\n  like: stainless-302\n  like: music-wire'),
      },
      command === 'design' ? 'safety.static is repeated' : 'material.like is repeated',
    ),
    C('a repeated key names its line (YAML)', { text: 'units: si\nunits: si\n' }, 'line 2'),
    C(
      'a repeated top-level key (JSON)',
      {
        text: JSON.stringify(JSON.parse(JSON.stringify(command === 'design' ? GOOD_REQUIREMENTS : GOOD_SPRING)), null, 1).replace(
          /\n}$/,
          ',\n "units": "us"\n}',
        ),
        ext: 'json',
      },
      'units is repeated',
    ),
    C('a repeated nested key (JSON)', { text: '{\n"units": "si",\n"load": {"force": 20,\n "force": 30}\n}', ext: 'json' }, 'load.force is repeated'),
    C('a repeated key names its line (JSON)', { text: '{\n"units": "si",\n\n"units": "us"\n}', ext: 'json' }, 'line 4'),
    C('a YAML syntax error names its line', { text: 'units: si\nmaterial: [stainless-302\nends: plain\n' }, 'line'),
    C('a bad indent names its line', { text: 'units: si\nload:\n  force: 20\n length: 35\n' }, 'line 4'),
    C('a tab indent', { text: 'units: si\nload:\n\tforce: 20\n' }, 'line 3'),
    C('two YAML documents', { text: good + '---\nunits: us\n' }, 'line'),
    C('malformed JSON', { text: '{"units": "si", "material": }', ext: 'json' }, 'well-formed JSON'),
    C('JSON with a trailing comma names its line', { text: '{"units": "si",\n"material": "music-wire",\n}', ext: 'json' }, 'at line 3'),
    C('JSON with a bad token names its line', { text: '{"units": "si",\n\n"material": tru}', ext: 'json' }, 'at line 3'),
    C('JSON cut short', { text: '{"units": "si",\n"material":', ext: 'json' }, 'well-formed JSON'),
    C('a JSON list at the top', { text: '[1, 2, 3]', ext: 'json' }, 'a mapping of fields'),
    C('a JSON number at the top', { text: '42', ext: 'json' }, 'a mapping of fields'),
    C('a YAML list at the top', { text: '- units: si\n- material: music-wire\n' }, 'a mapping of fields'),
    C('a YAML scalar at the top', { text: 'just some words\n' }, 'a mapping of fields'),
    C('a huge file', { text: good + `# ${'x'.repeat(1100 * 1024)}\n` }, '1 MiB'),
    C('a folder instead of a file', { path: '.' }, 'folder'),
    C('a missing file', { path: '/nonexistent/coilfront/input.yaml' }, 'not found'),
    C('a hex number in the file', { text: good.replace(/^units: si$/m, 'units: si\nseed: 0x10') }, 'seed'),
    C('an octal number in the file', { text: good.replace(/^units: si$/m, 'units: si\ncycles: 0o17') }, 'cycles'),
    C('a __proto__ key (YAML)', { text: good + '__proto__:\n  cycles: 100000\n' }, '__proto__'),
    C(
      'a __proto__ key (JSON)',
      { text: JSON.stringify(command === 'design' ? GOOD_REQUIREMENTS : GOOD_SPRING).replace(/^\{/, '{"__proto__": {"cycles": 1e5}, '), ext: 'json' },
      '__proto__',
    ),
    C('a constructor key', { text: good + 'constructor:\n  prototype:\n    cycles: 1\n' }, 'constructor'),
    C(
      'a nested __proto__ key (YAML)',
      { text: good.replace(/^material: stainless-302$/m, 'material:\n  like: stainless-302\n  __proto__:\n    density: 1') },
      'material.__proto__',
    ),
    C(
      'a nested __proto__ key (JSON)',
      {
        text: JSON.stringify(command === 'design' ? GOOD_REQUIREMENTS : GOOD_SPRING).replace(
          '"material":"stainless-302"',
          '"material":{"like":"stainless-302","__proto__":{"density":1}}',
        ),
        ext: 'json',
      },
      'material.__proto__',
    ),
    C('deep JSON object nesting', { text: `{"units": "si", "x": ${'{"a": '.repeat(100)}1${'}'.repeat(100)}}`, ext: 'json' }, 'levels of nesting'),
    C('a misspelt field', { text: good + 'matrial: music-wire\n' }, 'matrial'),
    C('a 1 MB string in a field', { text: good.replace(/^units: si$/m, `units: ${'z'.repeat(900 * 1024)}`) }, 'units'),
  ];
}

// ---- spring-file fields (analyze) --------------------------------------------------------------------

const springFields: BadCase[] = [
  S('material missing', { material: DELETE }, 'material'),
  S('material of the wrong type', { material: 42 }, 'material'),
  S('an unknown material', { material: 'kryptonite' }, 'material'),
  S('material as an empty list', { material: [] }, 'material'),
  S('override without like', { material: { shear_modulus: 69000 } }, 'material.like'),
  S('override with an unknown field', { material: { like: 'stainless-302', colour: 'red' } }, 'material.colour'),
  S('override shear modulus zero', { material: { like: 'stainless-302', shear_modulus: 0 } }, 'material.shear_modulus'),
  S('override shear modulus negative', { material: { like: 'stainless-302', shear_modulus: '-69 GPa' } }, 'material.shear_modulus'),
  S('override shear modulus as a length', { material: { like: 'stainless-302', shear_modulus: '69 mm' } }, 'material.shear_modulus'),
  S('override elastic modulus below G', { material: { like: 'stainless-302', elastic_modulus: '50 GPa' } }, 'material.elastic_modulus'),
  S('override elastic modulus above 3G', { material: { like: 'stainless-302', elastic_modulus: '300 GPa' } }, 'material.elastic_modulus'),
  S('override shear modulus above E/2', { material: { like: 'stainless-302', shear_modulus: '150 GPa' } }, 'material.shear_modulus'),
  S('override density as a stress', { material: { like: 'stainless-302', density: '8 MPa' } }, 'material.density'),
  S('override density huge', { material: { like: 'stainless-302', density: 1e12 } }, 'material.density'),
  S('override tensile strength NaN', { material: { like: 'stainless-302', tensile_strength: 'NaN' } }, 'material.tensile_strength'),
  S(
    'override allowable above the tensile strength',
    { material: { like: 'stainless-302', tensile_strength: 1500, allowable_stress: 1600 } },
    'material.allowable_stress',
  ),
  S('wire diameter missing', { wire_diameter: DELETE }, 'wire_diameter'),
  S('wire diameter as text', { wire_diameter: 'thin' }, 'wire_diameter'),
  S('wire diameter as a force', { wire_diameter: '1 N' }, 'wire_diameter'),
  S('wire diameter negative', { wire_diameter: -1 }, 'wire_diameter'),
  S('wire diameter zero', { wire_diameter: 0 }, 'wire_diameter'),
  S('wire diameter 1e-300 mm', { wire_diameter: 1e-300 }, 'wire_diameter'),
  S('wire diameter huge', { wire_diameter: '1e30 m' }, 'wire_diameter'),
  S('wire diameter "Infinity"', { wire_diameter: 'Infinity' }, 'wire_diameter'),
  S('wire diameter "NaN"', { wire_diameter: 'NaN' }, 'wire_diameter'),
  S('wire diameter .nan', { wire_diameter: Number.NaN }, 'wire_diameter'),
  S('wire diameter .inf', { wire_diameter: Number.POSITIVE_INFINITY }, 'wire_diameter'),
  S('wire diameter as a list', { wire_diameter: [1, 2] }, 'wire_diameter'),
  S('wire diameter in hex text', { wire_diameter: '0x1 mm' }, 'wire_diameter'),
  S('two diameters', { mean_diameter: 8 }, 'outer_diameter'),
  S('no diameter', { outer_diameter: DELETE }, 'mean_diameter | outer_diameter | inner_diameter'),
  S('outer diameter below the wire', { outer_diameter: 1.5 }, 'outer_diameter'),
  S('outer diameter huge', { outer_diameter: 1e9 }, 'outer_diameter'),
  S('inner diameter negative', { outer_diameter: DELETE, inner_diameter: -3 }, 'inner_diameter'),
  S('ends unknown', { ends: 'flared' }, 'ends'),
  S('ends as a list', { ends: ['plain'] }, 'ends'),
  S('both coil counts', { total_coils: 10 }, 'total_coils'),
  S('active coils zero', { active_coils: 0 }, 'active_coils'),
  S('active coils as text', { active_coils: 'eight' }, 'active_coils'),
  S('active coils in hex text', { active_coils: '0x8' }, 'active_coils'),
  S('total coils within the inactive ones', { active_coils: DELETE, total_coils: 2 }, 'total_coils'),
  S('free length below solid', { free_length: 5 }, 'free_length'),
  S('free length as a temperature', { free_length: '30 C' }, 'free_length'),
  S('free length empty', { free_length: null }, 'free_length'),
  S('lengths empty', { lengths: [] }, 'lengths'),
  S('lengths not a list', { lengths: 22 }, 'lengths'),
  S('a length above free', { lengths: [22, 40] }, 'lengths[1]'),
  S('a length below solid', { lengths: [22, 1] }, 'lengths[1]'),
  S('a length as a force', { lengths: ['22 N'] }, 'lengths[0]'),
  S('lengths and forces', { forces: [10] }, 'lengths, forces'),
  S('a force beyond solid', { lengths: DELETE, forces: [1e6] }, 'forces[0]'),
  S('a negative force', { lengths: DELETE, forces: [-5] }, 'forces[0]'),
  S('a 1e308 kN force', { lengths: DELETE, forces: ['1e308 kN'] }, 'forces[0]'),
  S('forces empty', { lengths: DELETE, forces: [] }, 'forces'),
  S('cycles negative', { cycles: -1 }, 'cycles'),
  S('cycles zero', { cycles: 0 }, 'cycles'),
  S('cycles huge', { cycles: 1e300 }, 'cycles'),
  S('cycles "Infinity"', { cycles: 'Infinity' }, 'cycles'),
  S('cycles in hex text', { cycles: '0x100' }, 'cycles'),
  S('temperature below absolute zero', { temperature: -300 }, 'temperature'),
  S('temperature below absolute zero in F', { temperature: '-500 F' }, 'temperature'),
  S('temperature huge', { temperature: 1e6 }, 'temperature'),
  S('temperature as a length', { temperature: '95 mm' }, 'temperature'),
  S('forcing frequency negative', { forcing_frequency: -5 }, 'forcing_frequency'),
  S('forcing frequency huge', { forcing_frequency: '1e12 Hz' }, 'forcing_frequency'),
  S('seating unknown', { seating: 'glued' }, 'seating'),
  S('fatigue criterion unknown', { fatigue_criterion: 'soderberg' }, 'fatigue_criterion'),
  S('stress factor unknown', { stress_factor: 'guess' }, 'stress_factor'),
  S('peened as text', { peened: 'yes' }, 'peened'),
  S('set removed as a number', { set_removed: 1 }, 'set_removed'),
  S('direct shear rate as text', { direct_shear_rate: 'true' }, 'direct_shear_rate'),
  S('coil gap rule empty', { coil_gap_rule: null }, 'coil_gap_rule'),
  S('clash allowance negative', { clash_allowance: -0.1 }, 'clash_allowance'),
  S('clash allowance huge', { clash_allowance: '5000%' }, 'clash_allowance'),
  S('surge margin zero', { surge_margin: 0 }, 'surge_margin'),
  S('surge margin below 1', { surge_margin: 0.5 }, 'surge_margin: expected a number of at least 1'),
  S('surge margin huge', { surge_margin: 1e9 }, 'surge_margin'),
  S('surge ends unknown', { surge_ends: 'springs' }, 'surge_ends'),
  S('surge ends as a boolean', { surge_ends: true }, 'surge_ends'),
  S('units unknown', { units: 'imperial' }, 'units'),
  S('units as a number', { units: 1 }, 'units'),
];

// ---- requirements-file fields (design) ---------------------------------------------------------------

const requirementFields: BadCase[] = [
  R('material missing', { material: DELETE }, 'material'),
  R('material an empty list', { material: [] }, 'material'),
  R('material list with a bad id', { material: ['music-wire', 'unobtainium'] }, 'material[1]'),
  R('material family unknown', { material: { family: 'plastic' } }, 'material.family'),
  R('material family with a stray field', { material: { family: 'stainless', grade: 2 } }, 'material.grade'),
  R('material override E below G', { material: { like: 'stainless-302', elastic_modulus: '60 GPa' } }, 'material.elastic_modulus'),
  R(
    'material override in a list, E below G',
    { material: ['music-wire', { like: 'stainless-302', elastic_modulus: '60 GPa' }] },
    'material[1].elastic_modulus',
  ),
  R('material override allowable negative', { material: { like: 'stainless-302', allowable_stress: -5 } }, 'material.allowable_stress'),
  R('ends an empty list', { ends: [] }, 'ends'),
  R('ends with an unknown type', { ends: ['plain', 'flared'] }, 'ends[1]'),
  R('ends as a number', { ends: 3 }, 'ends'),
  R('ends empty', { ends: null }, 'ends'),
  R('load missing', { load: DELETE }, 'load'),
  R('load as a number', { load: 20 }, 'load'),
  R('load force missing', { 'load.force': DELETE }, 'load.force'),
  R('load force zero', { 'load.force': 0 }, 'load.force'),
  R('load force negative', { 'load.force': -20 }, 'load.force'),
  R('load force 1e308 kN', { 'load.force': '1e308 kN' }, 'load.force'),
  R('load force as a length', { 'load.force': '20 mm' }, 'load.force'),
  R('load force "NaN"', { 'load.force': 'NaN' }, 'load.force'),
  R('load force .inf', { 'load.force': Number.POSITIVE_INFINITY }, 'load.force'),
  R('load force 1e-300 N', { 'load.force': 1e-300 }, 'load.force'),
  R('load length zero', { 'load.length': 0 }, 'load.length'),
  R('load length as a stress', { 'load.length': '35 MPa' }, 'load.length'),
  R('load with a stray field', { 'load.stroke': 10 }, 'load.stroke'),
  R('operating length above the working length', { operating_length: 40 }, 'operating_length'),
  R('operating length negative', { operating_length: -25 }, 'operating_length'),
  R('operating force below the working force', { operating_force: 10 }, 'operating_force'),
  R('operating force without its length', { operating_length: DELETE }, 'operating_length'),
  R('operating force huge', { operating_force: '1e9 kN' }, 'operating_force'),
  R('envelope missing', { envelope: DELETE }, 'envelope'),
  R('envelope as a list', { envelope: [16, 60] }, 'envelope'),
  R('envelope max OD negative', { 'envelope.max_outer_diameter': -16 }, 'envelope.max_outer_diameter'),
  R('envelope max OD zero', { 'envelope.max_outer_diameter': 0 }, 'envelope.max_outer_diameter'),
  R('envelope max OD empty', { 'envelope.max_outer_diameter': null }, 'envelope.max_outer_diameter'),
  R('envelope max OD as a force', { 'envelope.max_outer_diameter': '16 N' }, 'envelope.max_outer_diameter'),
  R('envelope max OD huge', { 'envelope.max_outer_diameter': '1e9 m' }, 'envelope.max_outer_diameter'),
  R('envelope min ID above max OD (reversed)', { 'envelope.min_inner_diameter': 17 }, 'envelope.min_inner_diameter'),
  R('envelope max free length below the working length', { 'envelope.max_free_length': 30 }, 'envelope.max_free_length'),
  R('envelope max solid length "Infinity"', { 'envelope.max_solid_length': 'Infinity' }, 'envelope.max_solid_length'),
  R('envelope with a stray field', { 'envelope.max_od': 16 }, 'envelope.max_od'),
  R('wire sizes an unknown series', { wire_sizes: 'imperial' }, 'wire_sizes'),
  R('wire sizes an empty list', { wire_sizes: [] }, 'wire_sizes'),
  R("wire sizes below the material's range", { wire_sizes: [0.01, 1] }, 'wire_sizes[0]'),
  R("wire sizes above the material's range", { wire_sizes: [1, 40] }, 'wire_sizes[1]'),
  R('wire sizes with a negative size', { wire_sizes: [1, -1] }, 'wire_sizes[1]'),
  R('wire sizes 1e-300 mm', { wire_sizes: [1e-300] }, 'wire_sizes[0]'),
  R('wire sizes as a number', { wire_sizes: 1.2 }, 'wire_sizes'),
  R('active coils reversed', { active_coils: [30, 3] }, 'active_coils'),
  R('active coils an empty list', { active_coils: [] }, 'active_coils'),
  R('active coils one number', { active_coils: [3] }, 'active_coils'),
  R('active coils zero', { active_coils: [0, 30] }, 'active_coils[0]'),
  R('active coils huge', { active_coils: [3, 1e9] }, 'active_coils[1]'),
  R('active coils as text', { active_coils: ['three', 30] }, 'active_coils[0]'),
  R('coil step zero', { coil_step: 0 }, 'coil_step'),
  R('coil step negative', { coil_step: -0.25 }, 'coil_step'),
  R('coil step 1e-9', { coil_step: 1e-9 }, 'coil_step'),
  R('coil step huge', { coil_step: 1e6 }, 'coil_step'),
  // Every material, every end type at coil_step 0.01 (2,149,996 combinations) is the genetic search's
  // under --strategy auto; only a grid forced onto it is too much work.
  {
    ...R(
      'coil step too fine for a forced grid',
      { material: 'any', ends: ['plain', 'squared', 'squared-ground', 'plain-ground'], coil_step: 0.01 },
      'coil_step',
    ),
    args: ['--strategy', 'grid'],
  },
  R(
    'coil step too fine for the best of every wire',
    { material: 'any', ends: ['plain', 'squared', 'squared-ground', 'plain-ground'], coil_step: 0.01, best_per_wire: true },
    'coil_step',
  ),
  // A sweep bounds each value's search as design bounds one, before any search runs, naming the value.
  {
    ...R(
      'sweep value too large for a forced grid',
      { material: 'any', ends: ['plain', 'squared', 'squared-ground', 'plain-ground'], coil_step: 0.01 },
      '--vary envelope.max_outer_diameter=14',
    ),
    command: 'sweep',
    args: ['--vary', 'envelope.max_outer_diameter=14:16:1', '--strategy', 'grid'],
  },
  {
    ...R(
      'sweep value too large for the best of every wire',
      { material: 'any', ends: ['plain', 'squared', 'squared-ground', 'plain-ground'], coil_step: 0.01, best_per_wire: true },
      'coil_step',
    ),
    command: 'sweep',
    args: ['--vary', 'envelope.max_outer_diameter=14:16:1'],
  },
  R('index reversed', { index: [12, 4] }, 'index'),
  R('index at 1', { index: [1, 12] }, 'index[0]'),
  R('index huge', { index: [4, 1e6] }, 'index[1]'),
  R('index empty', { index: [] }, 'index'),
  R('diameter resolution 1e-9', { diameter_resolution: 1e-9 }, 'diameter_resolution'),
  R('diameter resolution 1e-4 mm', { diameter_resolution: '0.0001 mm' }, 'diameter_resolution'),
  R('diameter resolution zero', { diameter_resolution: 0 }, 'diameter_resolution'),
  R('diameter resolution huge', { diameter_resolution: '1 m' }, 'diameter_resolution'),
  R('diameter resolution as a force', { diameter_resolution: '0.01 N' }, 'diameter_resolution'),
  R('safety as a number', { safety: 1.2 }, 'safety'),
  R('safety static zero', { safety: { static: 0 } }, 'safety.static'),
  R('safety fatigue negative', { safety: { fatigue: -1.5 } }, 'safety.fatigue'),
  R('safety surge huge', { safety: { surge: 1e9 } }, 'safety.surge'),
  R('safety static huge', { safety: { static: 1e6 } }, 'safety.static'),
  // A safety factor below 1 designs the spring past its own allowable: refused, never warned about.
  R('safety static below 1', { safety: { static: 0.8 } }, 'safety.static: expected a number of at least 1'),
  R('safety fatigue below 1', { safety: { fatigue: 0.95 } }, 'safety.fatigue: expected a number of at least 1'),
  R('safety surge below 1', { safety: { surge: 0.5 } }, 'safety.surge: expected a number of at least 1'),
  R('safety with a stray field', { safety: { buckling: 2 } }, 'safety.buckling'),
  R('seating unknown', { seating: 'glued' }, 'seating'),
  R('load tolerance 100%', { load_tolerance: '100%' }, 'load_tolerance'),
  R('load tolerance negative', { load_tolerance: -0.05 }, 'load_tolerance'),
  R('load tolerance as text', { load_tolerance: 'five percent' }, 'load_tolerance'),
  R('cycles negative', { cycles: -5e5 }, 'cycles'),
  R('cycles huge', { cycles: 1e100 }, 'cycles'),
  R('cycles as a list', { cycles: [5e5] }, 'cycles'),
  R('temperature below absolute zero', { temperature: -274 }, 'temperature'),
  R('temperature as a force', { temperature: '40 N' }, 'temperature'),
  R('forcing frequency as a length', { forcing_frequency: '50 mm' }, 'forcing_frequency'),
  R('allowable stress zero', { allowable_stress: 0 }, 'allowable_stress'),
  R('allowable stress as a length', { allowable_stress: '600 mm' }, 'allowable_stress'),
  R('allowable stress huge', { allowable_stress: '1e12 GPa' }, 'allowable_stress'),
  R('clash allowance huge', { clash_allowance: 50 }, 'clash_allowance'),
  R('peened as text', { peened: 'no' }, 'peened'),
  R('guided as a number', { guided: 0 }, 'guided'),
  R('solid safe empty', { solid_safe: null }, 'solid_safe'),
  R('best per wire as text', { best_per_wire: 'yes' }, 'best_per_wire'),
  R('fatigue criterion unknown', { fatigue_criterion: 'basquin' }, 'fatigue_criterion'),
  R('stress factor unknown', { stress_factor: 'none' }, 'stress_factor'),
  R('rank unknown', { rank: 'price' }, 'rank'),
  R('top zero', { top: 0 }, 'top'),
  R('top fractional', { top: 2.5 }, 'top'),
  R('top huge', { top: 1e9 }, 'top'),
  R('seed fractional', { seed: 1.5 }, 'seed'),
  R('seed huge', { seed: 1e30 }, 'seed'),
  R('seed as text', { seed: 'lucky' }, 'seed'),
  R('surge ends unknown', { surge_ends: 'clamped' }, 'surge_ends'),
  R('working tolerance 100%', { working_tolerance: '100%' }, 'working_tolerance'),
  R('working tolerance negative', { working_tolerance: -0.02 }, 'working_tolerance'),
  R('units unknown', { units: 'metric' }, 'units'),
  R('a misspelt field', { operating_lenght: 25 }, 'operating_lenght'),
];

// ---- command-line options ----------------------------------------------------------------------------

const options: BadCase[] = [
  O('--set without =', 'design', ['--set', 'envelope.max_outer_diameter'], '--set'),
  O('--set with an empty value', 'design', ['--set', 'envelope.max_free_length='], '--set'),
  O('--set with a YAML null', 'design', ['--set', 'envelope.max_free_length=~'], '--set'),
  O('--set with a bad path', 'design', ['--set', 'Envelope.Max=3'], '--set'),
  O('--set __proto__', 'design', ['--set', '__proto__.cycles=1e5'], '--set'),
  O('--set constructor.prototype', 'design', ['--set', 'constructor.prototype.cycles=1e5'], '--set'),
  O('--set a nested __proto__', 'design', ['--set', 'envelope.__proto__.x=1'], '--set'),
  O('--set an unknown field', 'design', ['--set', 'cycle=1e5'], '--set cycle'),
  O('--set an unknown nested field', 'design', ['--set', 'envelope.max_od=15'], '--set envelope.max_od'),
  O('--set a bad value', 'design', ['--set', 'envelope.max_outer_diameter=wide'], '--set envelope.max_outer_diameter'),
  O('--set a hex value', 'design', ['--set', 'envelope.max_outer_diameter=0x10'], '--set'),
  O('--set 1e308 kN', 'design', ['--set', 'load.force=1e308 kN'], '--set load.force'),
  O('--set ends to an empty list', 'design', ['--set', 'ends=[]'], '--set ends'),
  O('--set a temperature below absolute zero', 'design', ['--set', 'temperature=-300'], '--set temperature'),
  O('--set a safety factor below 1', 'design', ['--set', 'safety.static=0.8'], 'safety.static'),
  O('--set diameter_resolution=1e-9', 'design', ['--set', 'diameter_resolution=1e-9'], '--set diameter_resolution'),
  O('--set removing a required field', 'design', ['--set', 'load=none'], '--set load'),
  O('--set an object with a __proto__ key', 'design', ['--set', 'material={like: stainless-302, __proto__: {density: 1}}'], '--set material.__proto__'),
  O(
    '--set a YAML alias bomb',
    'design',
    ['--set', 'material={a: &a [x,x,x,x,x,x,x,x,x,x], b: &b [*a,*a,*a,*a,*a,*a,*a,*a,*a,*a], c: [*b,*b,*b,*b,*b,*b,*b,*b,*b,*b]}'],
    'alias bomb',
  ),
  O('--max-od negative', 'design', ['--max-od', '-3'], '--max-od'),
  O('--max-od as a force', 'design', ['--max-od', '15 N'], '--max-od'),
  O('--min-id empty', 'design', ['--min-id', ''], '--min-id'),
  O('--top zero', 'design', ['--top', '0'], '--top'),
  O('--top negative', 'design', ['--top', '-1'], '--top'),
  O('--top fractional', 'design', ['--top', '1.5'], '--top'),
  O('--top as text', 'design', ['--top', 'ten'], '--top'),
  O('--top huge', 'design', ['--top', '1e9'], '--top'),
  O('--top in hex', 'design', ['--top', '0x10'], '--top'),
  O('--seed fractional', 'design', ['--seed', '1.5'], '--seed'),
  O('--seed as text', 'design', ['--seed', 'abc'], '--seed'),
  O('--seed huge', 'design', ['--seed', '1e30'], '--seed'),
  O('--seed in hex', 'design', ['--seed', '0x10'], '--seed'),
  O('--seed empty', 'design', ['--seed', ''], '--seed'),
  O('--rank unknown', 'design', ['--rank', 'price'], '--rank'),
  O('--strategy unknown', 'design', ['--strategy', 'luck'], '--strategy'),
  O('--units unknown', 'design', ['--units', 'imperial'], '--units'),
  O('an unknown option', 'design', ['--colour'], '--colour'),
  O('--report in a missing folder', 'design', ['--report', '{dir}/no/such/folder/r.html'], '--report'),
  O('--report over an existing file', 'design', ['--report', '{dir}/exists.html'], '--report', ['exists.html']),
  O('--report onto a folder', 'design', ['--report', '{dir}', '--force'], '--report'),
  O('--report onto the input file', 'design', ['--report', '{input}', '--force'], '--report'),
  O('--report empty', 'design', ['--report', ''], '--report'),
  O('--top', 'frontier', ['--top', '3'], '--top'),
  O('--rank', 'frontier', ['--rank', 'mass'], '--rank'),
  O('--per-wire', 'frontier', ['--per-wire'], '--per-wire'),
  O('--x equal to --y', 'frontier', ['--x', 'mass', '--y', 'mass'], '--y'),
  O('--x unknown', 'frontier', ['--x', 'price'], '--x'),
  O('-o new with --report existing', 'frontier', ['-o', '{dir}/new.csv', '--report', '{dir}/exists.html'], '--report', ['exists.html']),
  O('-o existing without --force', 'frontier', ['-o', '{dir}/exists.csv'], '--output', ['exists.csv']),
  O('-o and --report the same file', 'frontier', ['-o', '{dir}/same.out', '--report', '{dir}/same.out'], '--report'),
  O('-o onto the input file', 'frontier', ['-o', '{input}', '--force'], '--output'),
  O('-o in a missing folder', 'frontier', ['-o', '{dir}/missing/f.csv'], '--output'),
  O('--vary without =', 'sweep', ['--vary', 'envelope.max_outer_diameter'], '--vary'),
  O('--vary with empty bounds', 'sweep', ['--vary', 'envelope.max_outer_diameter=::1'], '--vary'),
  O('--vary in hex', 'sweep', ['--vary', 'envelope.max_outer_diameter=0x10:0x12:1'], '--vary'),
  O('--vary reversed', 'sweep', ['--vary', 'envelope.max_outer_diameter=24:14:1'], '--vary'),
  O('--vary with a zero step', 'sweep', ['--vary', 'envelope.max_outer_diameter=14:24:0'], '--vary'),
  O('--vary with a negative step', 'sweep', ['--vary', 'envelope.max_outer_diameter=14:24:-1'], '--vary'),
  O('--vary with too many values', 'sweep', ['--vary', 'envelope.max_outer_diameter=14:24:0.001'], '--vary'),
  O('--vary with two parts', 'sweep', ['--vary', 'envelope.max_outer_diameter=14:24'], '--vary'),
  O('--vary "Infinity"', 'sweep', ['--vary', 'envelope.max_outer_diameter=14:Infinity:1'], '--vary'),
  O('--vary a value the field refuses', 'sweep', ['--vary', 'envelope.max_outer_diameter=0:2:1'], '--vary envelope.max_outer_diameter=0'),
  O('--vary an unknown field', 'sweep', ['--vary', 'envelope.max_od=14:16:1'], '--vary'),
  O('--vary __proto__', 'sweep', ['--vary', '__proto__.cycles=1:2:1'], '--vary'),
  O('--vary a bad path', 'sweep', ['--vary', 'Envelope=1:2:1'], '--vary'),
  O('-o existing without --force', 'sweep', ['--vary', 'envelope.max_outer_diameter=14:16:1', '-o', '{dir}/exists.csv'], '--output', ['exists.csv']),
  O(
    '-o new with --report existing',
    'sweep',
    ['--vary', 'envelope.max_outer_diameter=14:16:1', '-o', '{dir}/new.csv', '--report', '{dir}/exists.html'],
    '--report',
    ['exists.html'],
  ),
  O('--report over an existing file', 'analyze', ['--report', '{dir}/exists.html'], '--report', ['exists.html']),
  O('--report in a missing folder', 'analyze', ['--report', '{dir}/none/r.html'], '--report'),
];

export const BAD_CASES: BadCase[] = [
  ...wholeFiles('analyze', goodSpringYaml),
  ...wholeFiles('design', goodReqYaml),
  ...springFields,
  ...requirementFields,
  ...options,
];
