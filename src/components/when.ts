import { getActivePinia } from 'pinia';
import { dateText, dateTimeText } from '@shared/display/format';
import type { DateFormat } from '@shared/model/settings';
import { usePreferencesStore } from '@/stores/preferences';

const relative = new Intl.RelativeTimeFormat(undefined, { numeric: 'auto' });

const STEPS: ReadonlyArray<[Intl.RelativeTimeFormatUnit, number]> = [
  ['second', 60],
  ['minute', 60],
  ['hour', 24],
  ['day', 7],
];

/** The date format on screen: the open frame's or the workshop's, ISO 8601 before either is known. */
function shownFormat(): DateFormat {
  return getActivePinia() ? usePreferencesStore().date : 'iso';
}

/** "3 minutes ago", "yesterday"; after a week the date itself, in the chosen format. */
export function formatWhen(iso: string, now: Date = new Date(), date: DateFormat = shownFormat()): string {
  const then = new Date(iso);
  if (Number.isNaN(then.getTime())) return '';
  let amount = (then.getTime() - now.getTime()) / 1000;
  if (Math.abs(amount) < 45) return 'just now';
  for (const [unit, size] of STEPS) {
    if (Math.abs(amount) < size) return relative.format(Math.round(amount), unit);
    amount /= size;
  }
  return dateText(then, { date });
}

/** Full date and 24-hour time in the chosen format, for tooltips, titles and lists. */
export function formatExact(iso: string, date: DateFormat = shownFormat()): string {
  return dateTimeText(iso, { date });
}
