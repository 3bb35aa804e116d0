/** The first message found at or below an error node (lists and pairs nest their errors). */
export function firstErrorMessage(node: unknown): string | undefined {
  if (!node || typeof node !== 'object') return undefined;
  const message = (node as { message?: unknown }).message;
  if (typeof message === 'string' && message) return message;
  for (const [key, child] of Object.entries(node)) {
    if (key === 'ref' || key === 'types') continue;
    const found = firstErrorMessage(child);
    if (found) return found;
  }
  return undefined;
}
