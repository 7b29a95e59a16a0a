import { convert } from '@vatside/dye-kit';

// Display precision only: every value shown comes from dye-kit or the server.

const upTo = (digits: number) => new Intl.NumberFormat('en-US', { maximumFractionDigits: digits });

const formats = [upTo(0), upTo(1), upTo(2), upTo(3)] as const;

/** Sensible metric precision: fewer decimals as numbers grow. */
export function formatAmount(value: number): string {
  const size = Math.abs(value);
  const format =
    size >= 1000 ? formats[0] : size >= 10 ? formats[1] : size >= 1 ? formats[2] : formats[3];
  return format.format(value);
}

export function formatPct(value: number): string {
  return `${upTo(2).format(value)} %`;
}

const dateFormat = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone: 'UTC' });
const dateTimeFormat = new Intl.DateTimeFormat('en-US', {
  dateStyle: 'medium',
  timeStyle: 'short',
});

/** A calendar date (YYYY-MM-DD) as written, without shifting it by the time zone. */
export const formatDay = (isoDate: string) =>
  dateFormat.format(new Date(`${isoDate.slice(0, 10)}T00:00:00Z`));
export const formatMoment = (iso: string) => dateTimeFormat.format(new Date(iso));

/** 90 → "1:30". */
export function formatTimer(seconds: number): string {
  const minutes = Math.floor(seconds / 60);
  return `${minutes}:${String(seconds % 60).padStart(2, '0')}`;
}

/** "1:30", "90" (seconds) or "" → seconds, or null when empty; NaN when unreadable. */
export function parseTimer(text: string): number | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const match = /^(\d{1,4})(?::([0-5]?\d))?$/.exec(trimmed);
  if (!match) return Number.NaN;
  return match[2] === undefined ? Number(match[1]) * 60 : Number(match[1]) * 60 + Number(match[2]);
}

/** Metric volume: mL under a liter, liters above. */
export function formatVolumeMl(mL: number): string {
  return mL >= 1000 ? `${formatAmount(convert(mL, 'mL', 'L'))} L` : `${formatAmount(mL)} mL`;
}
