/**
 * A memo of at most `maxKept` values, for keys that callers can name without end (a request's locale,
 * a word typed into a title): the first one kept is the first one forgotten.
 */
export function boundedMemo<T>(maxKept: number): (key: string, make: () => T) => T {
  const kept = new Map<string, T>();
  return (key, make) => {
    const found = kept.get(key);
    if (found !== undefined) return found;
    const made = make();
    if (kept.size >= maxKept) kept.delete(kept.keys().next().value!);
    kept.set(key, made);
    return made;
  };
}
