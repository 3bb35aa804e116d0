import Link from 'next/link';
import { formatDateTime, type DateFormat } from '@/lib/format/date-format';
import { ACTIVITY_GROUPS, type ActivityGroup, type ActivityLine } from './activity-words';

const GROUP_LABELS: Record<ActivityGroup, string> = {
  all: 'Everything',
  members: 'Members and roles',
  templates: 'Templates',
  photos: 'Photos',
  builds: 'Builds',
};

/** Recent activity in words, with a filter that is a plain link per group (works before any script runs). */
export function ActivityList({
  lines,
  group,
  dateFormat,
  hrefFor,
}: {
  lines: ActivityLine[];
  group: ActivityGroup;
  dateFormat: DateFormat;
  hrefFor: (group: ActivityGroup) => string;
}) {
  const shown = group === 'all' ? lines : lines.filter((line) => line.group === group);
  return (
    <div className="space-y-3">
      <nav aria-label="Filter the activity" className="flex flex-wrap gap-2 text-sm">
        {ACTIVITY_GROUPS.map((g) => (
          <Link
            key={g}
            href={hrefFor(g)}
            scroll={false}
            aria-current={g === group ? 'true' : undefined}
            className="inline-flex min-h-11 items-center rounded-full border border-steel-300 px-3 aria-[current=true]:border-gauge-600 aria-[current=true]:bg-gauge-600 aria-[current=true]:text-white dark:border-steel-600"
          >
            {GROUP_LABELS[g]}
          </Link>
        ))}
      </nav>
      {shown.length === 0 ? <p className="text-sm text-steel-500">Nothing recorded here yet.</p> : null}
      <ul aria-label="Activity" className="space-y-1.5 text-sm">
        {shown.map((line) => (
          <li key={line.key} className="flex flex-wrap gap-x-3">
            <time dateTime={line.at} className="font-mono text-xs text-steel-500">
              {formatDateTime(line.at, dateFormat)}
            </time>
            <span>
              {line.href ? (
                <Link href={line.href} className="underline decoration-steel-300 underline-offset-2 hover:decoration-gauge-600">
                  {line.text}
                </Link>
              ) : (
                line.text
              )}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
