import type { DateFormat } from '@/lib/format/date-format';

/**
 * A sheet's day (YYYY-MM-DD): the date in its title block and its PDF creation date, so that
 * equal requests on the same day give equal bytes wherever they are drawn (the server thread for
 * SVG, a PDF pool worker for PDF).
 */

/** The day as a date at midnight UTC. */
export function dayStart(day: string): Date {
  return new Date(`${day}T00:00:00Z`);
}

/** The day written as a date at midnight UTC in UTC: the calendar day itself, whatever zone it was taken in. */
export function dayFormat(locale: string): DateFormat {
  return { locale, timeZone: 'UTC' };
}
