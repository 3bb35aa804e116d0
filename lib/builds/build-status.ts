import type { BuildStatus } from './build-fields';

/**
 * A record moves open → done → handed-over, and back from done to open. Handed-over is
 * final: only a role allowed `build.reopen-handed-over` may change such a record at all.
 */
const NEXT: Record<BuildStatus, readonly BuildStatus[]> = {
  open: ['done'],
  done: ['open', 'handed-over'],
  'handed-over': ['done', 'open'],
};

/** Why `from` may not become `to`, or null when it may. */
export function statusChangeProblem(from: BuildStatus, to: BuildStatus): string | null {
  if (from === to || NEXT[from].includes(to)) return null;
  return `Status cannot go from ${from} to ${to}: a record goes open → done → handed-over (and from done back to open)`;
}

/** The dates a status change writes: finished when done, handed over when handed over, cleared when going back. */
export function statusDates(
  to: BuildStatus,
  today: string,
  current: { finishedOn: string | null; handedOverOn: string | null },
): { finishedOn: string | null; handedOverOn: string | null } {
  if (to === 'open') return { finishedOn: null, handedOverOn: null };
  if (to === 'done') return { finishedOn: current.finishedOn ?? today, handedOverOn: null };
  return { finishedOn: current.finishedOn ?? today, handedOverOn: current.handedOverOn ?? today };
}
