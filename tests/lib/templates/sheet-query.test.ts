import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { storedSheetQueryShape } from '@/lib/templates/sheet-query';

const schema = z.object(storedSheetQueryShape);

describe('storedSheetQueryShape', () => {
  it('takes a stored record’s sheet kinds and the two formats, PDF by default', () => {
    expect(schema.parse({ kind: 'ring' })).toEqual({ kind: 'ring', format: 'pdf' });
    expect(schema.parse({ format: 'svg' })).toEqual({ format: 'svg' });
  });

  it('names a bad parameter by its label with the allowed values', () => {
    const messages = schema.safeParse({ kind: 'scribe', format: 'png' }).error?.issues.map((i) => i.message);
    expect(messages).toEqual(['Sheet kind must be one of: wheel, ring, strip', 'Format must be one of: pdf, svg']);
  });
});
