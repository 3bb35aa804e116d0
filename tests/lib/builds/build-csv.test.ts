import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { BUILD_CSV_HEADERS, buildsToCsv } from '@/lib/builds/build-csv';
import { sampleBuild } from '@/tests/support/sample-build';

const parse = (csv: string) => Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });

describe('build records as CSV', () => {
  it('has a column per field with a CSV name, then the results, read back by papaparse', () => {
    const { data, meta, errors } = parse(buildsToCsv([sampleBuild()]));
    expect(errors).toEqual([]);
    expect(meta.fields).toEqual(BUILD_CSV_HEADERS);
    expect(meta.fields).toContain('customer_name');
    expect(meta.fields).toContain('timing_set_deg_btdc');
    const [row] = data;
    expect(row).toMatchObject({ customer_name: 'Avery Quillfeather', stroke_mm: '40', timing_set_deg_btdc: '18', status: 'open', technician: 'Rowan Tinsley' });
    // Durations 211.06° and 140.53° (Heywood eq. 2.5, worked in build-results.test.ts); correction −2° (midpoint, common practice).
    expect(row!.port_durations_deg).toBe('Exhaust:211.06;Transfer:140.53');
    // A plain negative number is no formula (the shared guard, lib/csv/formula-guard.ts, leaves it as it is).
    expect(row!.tdc_correction_deg).toBe('-2');
  });

  it('guards every cell that a spreadsheet would read as a formula, and leaves plain numbers as numbers', () => {
    const hostile = sampleBuild({ customerName: '=HYPERLINK("http://x.test","pay")', engineNumber: '+1-555', notes: '@SUM(A1)', pinOffsetMm: -0.5 });
    const [row] = parse(buildsToCsv([hostile])).data;
    expect(row!.customer_name).toBe('\'=HYPERLINK("http://x.test","pay")');
    expect(row!.engine_number).toBe("'+1-555");
    expect(row!.notes).toBe("'@SUM(A1)");
    expect(row!.pin_offset_mm).toBe('-0.5');
    // OWASP "CSV injection": no cell may start a formula; a plain signed number is not one.
    for (const cell of Object.values(row!)) if (!/^-?\d+(\.\d+)?$/.test(cell)) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
  });
});
