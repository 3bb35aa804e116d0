import type { GraduationLevel, Shape, Size } from './drawing';
import type { SheetRequest } from './sheet-request';

export type StripLayout = { rows: Shape[][]; keptLevels: GraduationLevel[]; stripLengthMm: number; warnings: string[] };

export function stripLayout(req: SheetRequest, _printable: Size): StripLayout {
  return { rows: [], keptLevels: [10], stripLengthMm: Math.PI * ((req.diameterMm ?? 0) + req.paperThicknessMm), warnings: [] };
}
