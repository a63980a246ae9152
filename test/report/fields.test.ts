// source: none needed; the renderers of the output fields registry against coilfront's own figures.
import { describe, expect, it } from 'vitest';
import type { FieldDefinition } from '../../src/kinds/kind.js';
import { fieldColumns, fieldGrid, fieldRecord, fieldRow } from '../../src/report/fields.js';
import { COMPRESSION_FIELDS, COMPRESSION_JSON_FIELDS, COMPRESSION_TABLE_FIELDS } from '../../src/kinds/compression/fields.js';
import { EXTENSION_FIELDS, EXTENSION_JSON_FIELDS, EXTENSION_TABLE_FIELDS } from '../../src/kinds/extension/fields.js';

interface Toy {
  d: number;
  tag?: string;
  f: number;
}
const FIELDS: FieldDefinition<Toy>[] = [
  { name: 'wire_diameter', unit: 'length', digits: 4, read: (c) => c.d, column: { head: 'd', digits: 3 } },
  { name: 'tag', unit: null, digits: 0, present: (c) => c.tag !== undefined, read: (c) => c.tag ?? null, column: { head: 'tag', digits: 0 } },
  { name: 'factor', unit: null, digits: 3, read: (c) => c.f, json: (c) => ({ value: c.f }) },
];

describe('fieldRecord (JSON)', () => {
  it('writes every field a candidate carries, in the list order, SI and unrounded; the json hook where given', () => {
    expect(fieldRecord(FIELDS, { d: 1.23456, f: 2 })).toEqual({ wire_diameter: 1.23456, factor: { value: 2 } });
    expect(Object.keys(fieldRecord(FIELDS, { d: 1, tag: 'x', f: 2 }))).toEqual(['wire_diameter', 'tag', 'factor']);
  });
});

describe('fieldGrid (text and HTML tables)', () => {
  it('a rank column, then each field with a column, its unit symbol after the heading, rounded in the unit system', () => {
    const g = fieldGrid(FIELDS, [{ d: 25.4, f: 1 }], 'us');
    expect(g.header).toEqual(['#', 'd in']);
    expect(g.rows).toEqual([['1', '1.00']]);
  });

  it('shows a column that only some rows carry, with a dash where a row does not', () => {
    const g = fieldGrid(
      FIELDS,
      [
        { d: 1, f: 1 },
        { d: 2, tag: 'b', f: 1 },
      ],
      'si',
    );
    expect(g.header).toEqual(['#', 'd mm', 'tag']);
    expect(g.rows.map((r) => r[2])).toEqual(['-', 'b']);
  });
});

describe('fieldRow (CSV)', () => {
  it('never writes a non-finite figure: null instead', () => {
    expect(fieldRow(FIELDS, { d: Infinity, f: NaN }, 'si')).toEqual([null, null, null]);
    expect(fieldColumns(FIELDS, 'si')).toEqual(['wire_diameter_mm', 'tag', 'factor']);
  });
});

describe('the kinds define each figure once', () => {
  it('every format of a kind reads the same definition of a shared name', () => {
    for (const f of COMPRESSION_TABLE_FIELDS) {
      const same = [...COMPRESSION_FIELDS, ...COMPRESSION_JSON_FIELDS].filter((g) => g.name === f.name);
      for (const g of same) expect(g).toBe(f);
    }
    for (const f of [...EXTENSION_TABLE_FIELDS, ...EXTENSION_JSON_FIELDS])
      for (const g of [...EXTENSION_FIELDS, ...EXTENSION_JSON_FIELDS].filter((x) => x.name === f.name)) expect(g).toBe(f);
  });

  it('names are unique within each format', () => {
    for (const list of [
      COMPRESSION_FIELDS,
      COMPRESSION_JSON_FIELDS,
      COMPRESSION_TABLE_FIELDS,
      EXTENSION_FIELDS,
      EXTENSION_JSON_FIELDS,
      EXTENSION_TABLE_FIELDS,
    ]) {
      expect(new Set(list.map((f) => f.name)).size).toBe(list.length);
    }
  });
});
