import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

export type JsonResult = { ok: boolean; status: number; body: Record<string, unknown> };

/** Sends JSON to one of the app's route handlers and reads the answer, never throwing. */
export async function submitJson(url: string, method: string, body?: unknown): Promise<JsonResult> {
  try {
    const res = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    return { ok: res.ok, status: res.status, body: text ? (JSON.parse(text) as Record<string, unknown>) : {} };
  } catch {
    return { ok: false, status: 0, body: { error: 'The server could not be reached: check the connection and try again' } };
  }
}

/** Puts the API's per-field issues on the form's fields; returns the overall message. */
export function applyIssues<T extends FieldValues>(result: JsonResult, setError: UseFormSetError<T>): string {
  const issues = Array.isArray(result.body.issues) ? (result.body.issues as { path: string; message: string }[]) : [];
  for (const issue of issues) setError(issue.path as Path<T>, { type: 'server', message: issue.message });
  return typeof result.body.error === 'string' ? result.body.error : `The request failed (HTTP ${result.status})`;
}
