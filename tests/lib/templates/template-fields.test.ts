import { describe, expect, it } from 'vitest';
import { CSV_COLUMN_SPECS } from '@/lib/templates/csv-columns';
import { TEMPLATE_SEARCH_FIELDS, TEMPLATE_SORT_KEYS } from '@/lib/templates/list-query';
import { parseTemplatesCsv, templatesToCsv } from '@/lib/templates/template-csv';
import { TEMPLATE_FIELD_LIST, templateFields } from '@/lib/templates/template-fields';
import { EMPTY_TEMPLATE, templateSchema } from '@/lib/templates/template-schema';
import { FIELD_LABELS, FIGURE_FIELDS, formatFieldValue } from '@/components/templates/field-labels';

// The field table is the one place a template field is declared; these are the things derived from it, written out.

describe('the template field table', () => {
  it('gives every field a SQL column and a CSV column', () => {
    for (const field of TEMPLATE_FIELD_LIST) {
      expect(field.column, field.key).toMatch(/^[a-z_]+$/);
      expect(field.csvColumn, field.key).toMatch(/^[a-z_]+$/);
    }
  });

  it('derives the empty template: no text, no measurement, no list, the first choice, not archived', () => {
    expect(EMPTY_TEMPLATE).toEqual({
      description: '',
      boreMm: null,
      strokeMm: null,
      rodMm: null,
      rotation: 'cw',
      rimDiameterMm: null,
      faceDiameterMm: null,
      flangeDiameterMm: null,
      hubHoleMm: null,
      staticAdvanceDeg: null,
      advanceMarksDeg: [],
      portTargets: [],
      notes: '',
      archived: false,
    });
  });

  it('derives the sort keys and the searched fields of the list', () => {
    expect(TEMPLATE_SORT_KEYS).toEqual([
      'name',
      'description',
      'boreMm',
      'strokeMm',
      'rodMm',
      'rotation',
      'rimDiameterMm',
      'faceDiameterMm',
      'flangeDiameterMm',
      'hubHoleMm',
      'staticAdvanceDeg',
      'version',
      'createdAt',
      'updatedAt',
    ]);
    expect(TEMPLATE_SEARCH_FIELDS.map((field) => field.column)).toEqual(['name', 'description']);
  });

  it('derives the CSV column table with each column’s kind and allowed values', () => {
    const byColumn = Object.fromEntries(CSV_COLUMN_SPECS.map((spec) => [spec.column, spec]));
    expect(byColumn.bore_mm).toEqual({ column: 'bore_mm', field: 'boreMm', kind: 'number', meaning: 'Bore, 10–150 mm' });
    expect(byColumn.name?.meaning).toBe('Name, 1–80 characters (required)');
    expect(byColumn.static_advance_deg_btdc?.meaning).toMatch(/^Static advance, 0–60° BTDC\./);
    expect(byColumn.port_targets?.kind).toBe('ports');
    expect(byColumn.advance_marks_deg_btdc?.kind).toBe('list');
    expect(byColumn.archived?.kind).toBe('boolean');
  });

  it('round-trips a full template through the derived CSV columns', () => {
    const template = templateSchema.parse({
      name: 'Invented 50',
      description: '=piston-port',
      boreMm: 40,
      rotation: 'ccw',
      rimDiameterMm: 112,
      flangeDiameterMm: 130,
      staticAdvanceDeg: 17,
      advanceMarksDeg: [16, 18],
      portTargets: [{ name: 'exhaust', opensCrankDeg: 92, closesCrankDeg: 268 }],
      archived: true,
    });
    expect(parseTemplatesCsv(templatesToCsv([template]))).toMatchObject({ ok: true, templates: [template] });
  });

  it('names fields on screen by their label and shows values in their unit', () => {
    expect(FIELD_LABELS.flangeDiameterMm).toBe(templateFields.flangeDiameterMm.label);
    expect(FIGURE_FIELDS).toEqual([
      'boreMm',
      'strokeMm',
      'rodMm',
      'rotation',
      'rimDiameterMm',
      'faceDiameterMm',
      'flangeDiameterMm',
      'hubHoleMm',
      'staticAdvanceDeg',
      'advanceMarksDeg',
    ]);
    expect(formatFieldValue('boreMm', 40, 'en-GB')).toBe('40 mm');
    expect(formatFieldValue('staticAdvanceDeg', 17, 'en-GB')).toBe('17° BTDC');
    expect(formatFieldValue('advanceMarksDeg', [16, 18], 'en-GB')).toBe('16, 18° BTDC');
    expect(formatFieldValue('rotation', 'ccw', 'en-GB')).toBe('counter-clockwise');
    expect(formatFieldValue('archived', false, 'en-GB')).toBe('no');
    expect(formatFieldValue('portTargets', [{ name: 'exhaust', opensCrankDeg: 92, closesCrankDeg: 268 }], 'en-GB')).toBe('exhaust 92°→268°');
    expect(formatFieldValue('faceDiameterMm', null, 'en-GB')).toBe('—');
    // de-DE writes a decimal comma (CLDR, via Node's Intl); a list of such numbers is then split by semicolons.
    expect(formatFieldValue('boreMm', 40.25, 'de-DE')).toBe('40,25 mm');
    expect(formatFieldValue('advanceMarksDeg', [16, 18.5], 'de-DE')).toBe('16; 18,5° BTDC');
    expect(formatFieldValue('portTargets', [{ name: 'exhaust', opensCrankDeg: 92.5, closesCrankDeg: 267.5 }], 'de-DE')).toBe('exhaust 92,5°→267,5°');
  });
});
