import 'server-only';
import type { Build } from '@/lib/builds/build';
import { customerCopy } from '@/lib/builds/customer-copy';
import { BuildRecordDocument } from './build-record-document';
import { registerSheetFonts } from './fonts';
import { renderDocumentToBuffer } from './render-document';
import type { DateFormat } from '@/lib/format/date-format';

export type CopyPaper = 'A4' | 'Letter';

/** The PDF bytes of a record's customer's copy: one page, the shipped fonts embedded (subset). */
export async function renderBuildRecordPdf(build: Build, shopName: string, paper: CopyPaper = 'A4', dateFormat?: DateFormat): Promise<Buffer> {
  registerSheetFonts();
  return renderDocumentToBuffer(BuildRecordDocument({ copy: customerCopy(build, shopName, dateFormat), paper: paper === 'A4' ? 'A4' : 'LETTER' }));
}
