import { describe, expect, it, vi } from 'vitest';

// A layout that throws stands in for any bug deep in the drawing code.
vi.mock('@/lib/sheet/build-drawing', () => ({
  buildDrawing: () => {
    throw new Error('internal detail /work/secret/path.ts:12');
  },
}));

const { POST } = await import('@/app/api/v1/sheets/route');

describe('POST /api/v1/sheets when drawing fails', () => {
  it('answers 500 in the JSON error shape, without the message or a stack', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const response = await POST(
      new Request('http://localhost/api/v1/sheets', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ kind: 'wheel', diameterMm: 100 }) }),
    );
    expect(response.status).toBe(500);
    expect(response.headers.get('content-type')).toMatch(/application\/json/);
    const text = await response.text();
    expect(JSON.parse(text)).toEqual({ error: expect.stringMatching(/could not be drawn/), issues: [] });
    expect(text).not.toMatch(/secret|\.ts:|at /);
  });
});
