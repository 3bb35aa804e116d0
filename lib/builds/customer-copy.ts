import type { Build } from './build';
import { buildFields, type BuildStatus } from './build-fields';
import { DEFAULT_DATE_FORMAT, formatDate, type DateFormat } from '@/lib/format/date-format';
import { formatDecimal } from '@/lib/format/number-format';

/**
 * The words and figures of the customer's copy of a build record, in the order the page
 * shows them: plain strings, so the PDF only lays them out. Angles to 0.1°, lengths to
 * 0.01 mm (what a dial gauge and a printed wheel resolve; common practice), written in the
 * reader's locale (lib/format/number-format.ts).
 */

export type CopyRow = { label: string; value: string };
export type CopyPortRow = { name: string; heightMm: string; opens: string; closes: string; duration: string; target: string; deviation: string; verdict: string };

export type CustomerCopy = {
  shopName: string;
  title: string;
  reference: string;
  date: string;
  job: CopyRow[];
  tdc: CopyRow[];
  timing: CopyRow[];
  ports: CopyPortRow[];
  portNotes: string[];
  toleranceText: string;
  other: CopyRow[];
  notes: string;
  cautions: string[];
};

/** The notes are cut here so the copy stays one page; the full text stays in the shop's record. */
export const COPY_NOTES_MAX = 500;

const STATUS_TEXT: Record<BuildStatus, string> = { open: 'In progress', done: 'Finished', 'handed-over': 'Handed over' };

const TIMING_CHECK_TEXT = {
  'static-light': 'static, with a continuity light',
  'static-feeler': 'static, with a feeler',
  strobe: 'with a strobe',
} as const;

export const CAUTIONS = [
  'These figures were measured on the day, on the engine as it came in. New parts, gaskets, head work or wear change them; have them checked again after such work.',
  'Timing set too far advanced can hole a piston; check it again if the engine pinks, runs hot or kicks back.',
  'Printed scales are true to size only when printed at 100 % with page scaling off.',
  'The engine maker’s manual and local regulations come first.',
];

export function degText(value: number | null | undefined, locale: string, suffix = '°'): string {
  return value === null || value === undefined ? '—' : `${formatDecimal(value, locale, { places: 1 })}${suffix}`;
}

/** "+1.5°", "−0.5°", "±0.0°": a correction or a deviation, its sign always written (a true minus sign). */
export function signedDegText(value: number | null | undefined, locale: string): string {
  if (value === null || value === undefined) return '—';
  const rounded = Math.round(value * 10) / 10;
  return `${rounded > 0 ? '+' : rounded < 0 ? '−' : '±'}${formatDecimal(Math.abs(rounded), locale, { places: 1 })}°`;
}

export function mmText(value: number | null | undefined, locale: string): string {
  return value === null || value === undefined ? '—' : `${formatDecimal(value, locale, { places: 2 })} mm`;
}

function tdcRows(build: Build, locale: string): CopyRow[] {
  if (!build.stops || !build.tdc) return [{ label: 'Method', value: 'Not recorded' }];
  const { readingADeg, readingBDeg, numbering, readingASide, readingBSide } = build.stops;
  const side = (s: string | undefined) => (numbering === 'split' && s ? ` ${s}` : '');
  const tdcSide = build.tdc.tdcReadingSide && build.tdc.tdcReadingSide !== 'TDC' ? ` ${build.tdc.tdcReadingSide}` : '';
  return [
    { label: 'Method', value: `Positive stop, ${numbering === 'full' ? '0–360°' : '0–180° each side'} wheel` },
    { label: 'Stop readings', value: `A ${degText(readingADeg, locale)}${side(readingASide)}, B ${degText(readingBDeg, locale)}${side(readingBSide)}` },
    { label: 'TDC found at', value: `${degText(build.tdc.tdcReadingDeg, locale)}${tdcSide} on the wheel` },
    { label: 'Pointer corrected by', value: signedDegText(build.tdc.correctionDeg, locale) },
  ];
}

function timingRows(build: Build, locale: string): CopyRow[] {
  if (build.timingSetDegBTDC === null && build.timingSetMmBTDC === null) return [{ label: 'Ignition timing', value: 'Not recorded' }];
  const rows: CopyRow[] = [
    { label: 'Set at', value: `${degText(build.timingSetDegBTDC, locale, '° BTDC')}  =  ${build.timingSetMmBTDC === null ? '—' : `${mmText(build.timingSetMmBTDC, locale)} BTDC`}` },
  ];
  if (build.advanceDeg !== null) rows.push({ label: 'Specified', value: degText(build.advanceDeg, locale, '° BTDC') });
  if (build.timingCheck)
    rows.push({
      label: 'Checked',
      value: build.timingCheck === 'strobe' && build.timingCheckRpm ? `${TIMING_CHECK_TEXT.strobe} at ${build.timingCheckRpm} rpm` : TIMING_CHECK_TEXT[build.timingCheck],
    });
  return rows;
}

function portRows(build: Build, locale: string): CopyPortRow[] {
  return build.ports.map((p) => ({
    name: p.name,
    heightMm: mmText(p.heightMm, locale),
    opens: p.status === 'opens' ? degText(p.opensDegATDC, locale, '° ATDC') : '—',
    closes: p.status === 'opens' ? degText(p.closesDegATDC, locale, '° ATDC') : '—',
    duration: p.status === 'never-opens' ? 'never opens' : degText(p.durationDeg, locale),
    target: p.targetDurationDeg === undefined ? '—' : degText(p.targetDurationDeg, locale),
    deviation: signedDegText(p.deviationDeg, locale),
    verdict: p.withinTolerance === undefined ? '' : p.withinTolerance ? 'within' : 'OUTSIDE',
  }));
}

function jobRows(build: Build): CopyRow[] {
  const rows: CopyRow[] = [{ label: buildFields.customerName.label, value: build.customerName }];
  if (build.customerPhone) rows.push({ label: buildFields.customerPhone.label, value: build.customerPhone });
  rows.push({ label: buildFields.engineDescription.label, value: build.engineDescription || '—' });
  if (build.engineNumber) rows.push({ label: buildFields.engineNumber.label, value: build.engineNumber });
  if (build.frameNumber) rows.push({ label: buildFields.frameNumber.label, value: build.frameNumber });
  rows.push({ label: buildFields.technicianId.label, value: build.technician?.name || '—' });
  rows.push({ label: 'Status', value: STATUS_TEXT[build.status] });
  return rows;
}

function otherRows(build: Build, locale: string): CopyRow[] {
  const rows: CopyRow[] = [];
  if (build.deckMm !== null) rows.push({ label: buildFields.deckMm.label, value: mmText(build.deckMm, locale) });
  if (build.squishMm !== null) rows.push({ label: buildFields.squishMm.label, value: mmText(build.squishMm, locale) });
  for (const m of build.otherMeasurements) rows.push({ label: m.name, value: [m.value, m.unit].filter(Boolean).join(' ') });
  return rows;
}

/** `dateFormat` writes the copy's date for its reader (DEVELOPERS.md, "Dates"). */
export function customerCopy(build: Build, shopName: string, dateFormat: DateFormat = DEFAULT_DATE_FORMAT): CustomerCopy {
  const { locale } = dateFormat;
  const notes = build.notes.length > COPY_NOTES_MAX ? `${build.notes.slice(0, COPY_NOTES_MAX).trimEnd()} … (the full notes are kept in the shop’s record)` : build.notes;
  const portNotes = build.ports.filter((p) => p.status !== 'opens').map((p) => `${p.name}: ${p.note}`);
  if (build.blowdownDeg !== null) portNotes.unshift(`Blowdown (exhaust opens before the transfers): ${degText(build.blowdownDeg, locale)}`);
  return {
    shopName,
    title: 'Engine timing record',
    reference: `Record ${build.id}, version ${build.version}`,
    date: formatDate(build.handedOverOn ?? build.finishedOn ?? build.openedOn, dateFormat),
    job: jobRows(build),
    tdc: tdcRows(build, locale),
    timing: timingRows(build, locale),
    ports: portRows(build, locale),
    portNotes,
    toleranceText: `Deviation is the measured duration minus the target; within means no more than ±${formatDecimal(build.toleranceDeg, locale, { maxPlaces: 1 })}° (the shop’s tolerance; ±2° is common practice).`,
    other: otherRows(build, locale),
    notes,
    cautions: CAUTIONS,
  };
}
