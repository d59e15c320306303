/**
 * A saved time as local date and time in ISO 8601 order, `YYYY-MM-DD HH:MM`: read the same way in every country
 * (a "02/12/2026" is 2 December in Europe and February 12 in the United States). Text that is not a time is returned
 * as it is.
 */
export function dateTimeLabel(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  const two = (n: number) => String(n).padStart(2, "0");
  return `${date.getFullYear()}-${two(date.getMonth() + 1)}-${two(date.getDate())} ${two(date.getHours())}:${two(date.getMinutes())}`;
}
