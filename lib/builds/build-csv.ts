import Papa from 'papaparse';
import { guardCell } from '@/lib/csv/formula-guard';
import type { Build } from './build';
import { BUILD_FIELD_LIST } from './build-fields';

/**
 * Build records as CSV: a column per field the field table gives a `csvColumn`, then the
 * measurements and results that are lists. Every cell goes through the shared formula guard
 * (lib/csv/formula-guard.ts), so no cell can start a spreadsheet formula.
 */

type Column = { header: string; cell: (b: Build) => unknown };

const round = (v: number | null | undefined, places: number) => (v === null || v === undefined ? '' : String(Number(v.toFixed(places))));

const FIELD_COLUMNS: Column[] = BUILD_FIELD_LIST.filter((f) => f.csvColumn).map((f) => ({
  header: f.csvColumn!,
  cell: (b: Build) => (b as unknown as Record<string, unknown>)[f.key],
}));

const RESULT_COLUMNS: Column[] = [
  { header: 'technician', cell: (b) => b.technician?.name ?? '' },
  { header: 'template', cell: (b) => b.template?.name ?? '' },
  { header: 'finished_on', cell: (b) => b.finishedOn ?? '' },
  { header: 'handed_over_on', cell: (b) => b.handedOverOn ?? '' },
  { header: 'stop_readings', cell: (b) => (b.stops ? `${b.stops.readingADeg}${b.stops.readingASide ?? ''}/${b.stops.readingBDeg}${b.stops.readingBSide ?? ''} ${b.stops.numbering}` : '') },
  { header: 'tdc_correction_deg', cell: (b) => round(b.tdc?.correctionDeg, 3) },
  { header: 'ports', cell: (b) => b.ports.map((p) => `${p.name}:${p.heightMm}`).join(';') },
  { header: 'port_durations_deg', cell: (b) => b.ports.map((p) => `${p.name}:${round(p.durationDeg, 2)}`).join(';') },
  { header: 'port_deviations_deg', cell: (b) => b.ports.filter((p) => p.deviationDeg !== undefined).map((p) => `${p.name}:${round(p.deviationDeg, 2)}`).join(';') },
  { header: 'blowdown_deg', cell: (b) => round(b.blowdownDeg, 2) },
  { header: 'sent_to', cell: (b) => b.sends.map((s) => `${s.to} ${s.sentAt}`).join(';') },
];

export const BUILD_CSV_HEADERS = [...FIELD_COLUMNS, ...RESULT_COLUMNS].map((c) => c.header);

const cellText = (value: unknown) => (value === null || value === undefined ? '' : String(value));

export function buildsToCsv(builds: Build[]): string {
  const columns = [...FIELD_COLUMNS, ...RESULT_COLUMNS];
  const rows = builds.map((b) => columns.map((c) => guardCell(cellText(c.cell(b)))));
  return Papa.unparse({ fields: columns.map((c) => c.header), data: rows }, { newline: '\r\n' });
}
