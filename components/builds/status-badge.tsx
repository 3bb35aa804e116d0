import type { BuildStatus } from '@/lib/builds/build-fields';

const TONE: Record<BuildStatus, string> = {
  open: 'border-spark-500 text-steel-900 dark:text-steel-100',
  done: 'border-gauge-600 text-gauge-700 dark:text-gauge-500',
  'handed-over': 'border-steel-400 text-steel-600 dark:text-steel-300',
};

/** A record's status as a small label; the word itself carries the meaning, the colour only helps. */
export function StatusBadge({ status }: { status: BuildStatus }) {
  return <span className={`rounded border px-2 py-0.5 text-xs font-semibold ${TONE[status]}`}>{status}</span>;
}
