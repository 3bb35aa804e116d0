import 'server-only';
import { headers } from 'next/headers';
import { dateFormatFor, type DateFormat } from '@/lib/format/date-format';

/**
 * The reader's date format on the server: the language of the request's Accept-Language and the deployment's time
 * zone, RIMSCALE_TIME_ZONE (an IANA name such as Europe/Berlin), UTC when it is unset or unknown.
 */
export function dateFormatOf(request: Request): DateFormat {
  return dateFormatFor(request.headers.get('accept-language'), process.env.RIMSCALE_TIME_ZONE);
}

/** dateFormatOf for pages and server actions, which read the request's headers through next/headers. */
export async function requestDateFormat(): Promise<DateFormat> {
  return dateFormatFor(await acceptLanguage(), process.env.RIMSCALE_TIME_ZONE);
}

// Outside a request (a server action called from a unit test) there are no headers: the default language then.
async function acceptLanguage(): Promise<string | null> {
  try {
    return (await headers()).get('accept-language');
  } catch {
    return null;
  }
}
