import { describe, expect, it, vi } from 'vitest';
import { AccessError } from '@/app/lib/authz';
import { guarded, SERVER_ERROR_MESSAGE } from '@/app/lib/route-handler';

describe('guarded', () => {
  it('passes the body’s own response through', async () => {
    const response = await guarded(async () => Response.json({ ok: true }, { status: 201 }));
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ ok: true });
  });

  it('answers an AccessError with its status in the API error shape', async () => {
    const response = await guarded(async () => {
      throw new AccessError(403, 'This needs the owner role');
    });
    expect(response.status).toBe(403);
    expect(await response.json()).toEqual({ error: 'This needs the owner role', issues: [] });
  });

  it('answers anything else as a 500 without internals, and logs the error on the server', async () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const failure = new Error('internal detail /work/secret/path.ts:12');
    const response = await guarded(async () => {
      throw failure;
    });
    expect(response.status).toBe(500);
    expect(response.headers.get('content-type')).toMatch(/application\/json/);
    const text = await response.text();
    expect(JSON.parse(text)).toEqual({ error: SERVER_ERROR_MESSAGE, issues: [] });
    expect(text).not.toMatch(/secret|\.ts:|at /);
    expect(log).toHaveBeenCalledWith(failure);
    log.mockRestore();
  });
});
