import { describe, expect, it } from 'vitest';
import { BodyTooLargeError, bodyLimitedRequest, readBodyBytes, sizeText } from '@/app/lib/request-body';

const post = (body: BodyInit) => new Request('http://app.test/x', { method: 'POST', body });

describe('readBodyBytes', () => {
  it('returns a body up to the limit byte for byte', async () => {
    expect(Array.from(await readBodyBytes(post(new Uint8Array([1, 2, 3])), 3))).toEqual([1, 2, 3]);
  });

  it('throws BodyTooLargeError one byte past the limit', async () => {
    await expect(readBodyBytes(post(new Uint8Array(4)), 3)).rejects.toBeInstanceOf(BodyTooLargeError);
  });
});

describe('bodyLimitedRequest', () => {
  it('passes a body within the limit through to any reader', async () => {
    const limited = bodyLimitedRequest(post('{"a":1}'), 7);
    expect(await limited.request.json()).toEqual({ a: 1 });
    expect(limited.exceeded()).toBe(false);
  });

  it('fails the read past the limit and says so, even when the reader wraps the error', async () => {
    const form = new FormData();
    form.set('file', new Blob([new Uint8Array(10_000)]), 'big.bin');
    const limited = bodyLimitedRequest(new Request('http://app.test/x', { method: 'POST', body: form }), 1000);
    await expect(limited.request.formData()).rejects.toThrow();
    expect(limited.exceeded()).toBe(true);
  });
});

describe('sizeText', () => {
  it('writes binary units (IEC 80000-13: 1 KiB = 1024 bytes)', () => {
    expect(sizeText(64 * 1024)).toBe('64 KiB');
    expect(sizeText(16 * 1024 * 1024)).toBe('16 MiB');
  });
});
