const relative = new Intl.RelativeTimeFormat(undefined, { numeric: 'auto' });
const absolute = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const dateOnly = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

const STEPS: ReadonlyArray<[Intl.RelativeTimeFormatUnit, number]> = [
  ['second', 60],
  ['minute', 60],
  ['hour', 24],
  ['day', 7],
];

/** "3 minutes ago", "yesterday"; after a week the date itself. */
export function formatWhen(iso: string, now: Date = new Date()): string {
  const then = new Date(iso);
  if (Number.isNaN(then.getTime())) return '';
  let amount = (then.getTime() - now.getTime()) / 1000;
  if (Math.abs(amount) < 45) return 'just now';
  for (const [unit, size] of STEPS) {
    if (Math.abs(amount) < size) return relative.format(Math.round(amount), unit);
    amount /= size;
  }
  return dateOnly.format(then);
}

/** Full date and time, for tooltips and titles. */
export function formatExact(iso: string): string {
  const then = new Date(iso);
  return Number.isNaN(then.getTime()) ? '' : absolute.format(then);
}
