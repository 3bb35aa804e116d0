import { describe, expect, it, vi } from 'vitest';

// A layout that throws stands in for any bug deep in the drawing code (SVG is drawn in this thread)…
vi.mock('@/lib/sheet/build-drawing', () => ({
  buildDrawing: () => {
    throw new Error('internal detail /work/secret/path.ts:12');
  },
}));
// …and a worker that fails for any bug on the PDF side (PDFs are drawn in the worker pool).
vi.mock('@/app/lib/pdf-pool', async (original) => ({
  ...(await original<typeof import('@/app/lib/pdf-pool')>()),
  renderPdf: () => Promise.reject(new Error('internal detail /work/secret/worker.ts:34')),
}));

const { POST } = await import('@/app/api/v1/sheets/route');

describe('POST /api/v1/sheets when drawing fails', () => {
  it.each(['svg', 'pdf'])('answers 500 in the JSON error shape, without the message or a stack (%s)', async (format) => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const response = await POST(
      new Request('http://localhost/api/v1/sheets', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ kind: 'wheel', diameterMm: 100, format }) }),
    );
    expect(response.status).toBe(500);
    expect(response.headers.get('content-type')).toMatch(/application\/json/);
    const text = await response.text();
    expect(JSON.parse(text)).toEqual({ error: expect.stringMatching(/could not be drawn/), issues: [] });
    expect(text).not.toMatch(/secret|\.ts:|at /);
  });
});
