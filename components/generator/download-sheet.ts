import type { FieldIssue } from '@/lib/sheet/sheet-request';
import { fileNameFromContentDisposition } from './content-disposition';

export type DownloadResult = { ok: true; fileName: string } | { ok: false; error: string; issues: FieldIssue[] };

/** POSTs a sheet request to the API and saves the answer under the server's file name. */
export async function downloadSheet(body: Record<string, unknown> & { format: 'pdf' | 'svg' }): Promise<DownloadResult> {
  let response: Response;
  try {
    response = await fetch('/api/v1/sheets', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });
  } catch {
    return { ok: false, error: 'The sheet could not be fetched: check the connection and try again', issues: [] };
  }
  if (!response.ok) return { ok: false, ...(await readError(response)) };
  const blob = await response.blob();
  const fileName = fileNameFromContentDisposition(response.headers.get('content-disposition'), `rimscale-sheet.${body.format}`);
  saveBlob(blob, fileName);
  return { ok: true, fileName };
}

async function readError(response: Response): Promise<{ error: string; issues: FieldIssue[] }> {
  try {
    const json = (await response.json()) as { error?: unknown; issues?: unknown };
    const issues = Array.isArray(json.issues)
      ? json.issues.filter((i): i is FieldIssue => typeof i?.path === 'string' && typeof i?.message === 'string')
      : [];
    return { error: typeof json.error === 'string' ? json.error : `The server answered ${response.status}`, issues };
  } catch {
    return { error: `The server answered ${response.status}`, issues: [] };
  }
}

function saveBlob(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 30_000);
}
