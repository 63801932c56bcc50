const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const dateOnly = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/**
 * A server timestamp (ISO 8601) in the reader's locale and time zone; unparsable input is shown as given.
 * @example formatDateTime('2025-03-04T09:30:00Z') // e.g. '4 Mar 2025, 10:30'
 */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
}

/**
 * The date part only, for "joined" columns.
 * @example formatDate('2025-03-04T09:30:00Z') // e.g. '4 Mar 2025'
 */
export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateOnly.format(date);
}
