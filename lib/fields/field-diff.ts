/** One field's change between two states of a record, old → new (null for not set). */
type Change<K extends string> = { field: K; from: unknown; to: unknown };

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The fields among `keys` (the field table's order) that `after` sets to another value than `before` holds. */
export function diffFields<K extends string>(keys: readonly K[], before: Partial<Record<K, unknown>>, after: Partial<Record<K, unknown>>): Array<Change<K>> {
  const changes: Array<Change<K>> = [];
  for (const field of keys) {
    if (!(field in after)) continue;
    const from = before[field] ?? null;
    const to = after[field] ?? null;
    if (!sameValue(from, to)) changes.push({ field, from, to });
  }
  return changes;
}
