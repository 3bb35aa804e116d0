'use client';

import { useWatch, type Control, type FieldValues } from 'react-hook-form';
import type { z } from 'zod';

/**
 * Results as you type: the watched values are checked with the same schema the
 * resolver and the route handler use, and computed only when they pass.
 */
export function useLiveResult<T extends FieldValues, S extends z.ZodType, R>(
  control: Control<T, unknown, z.output<S>>,
  schema: S,
  compute: (valid: z.output<S>) => R,
): R | null {
  const values = useWatch({ control });
  const parsed = schema.safeParse(values);
  if (!parsed.success) return null;
  try {
    return compute(parsed.data);
  } catch {
    return null;
  }
}
