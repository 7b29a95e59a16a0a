import type { DyeLogEntry, DyeLogUnit } from '@vatside/contracts/dye-log';

const unitNames: Record<DyeLogUnit, string> = { mL: 'mL', drop: 'drops', gGel: 'g gel' };

/** "12.5 mL", "6 drops": amounts rounded to what a measuring jug or a dropper can show. */
export const formatAmount = (amount: number, unit: DyeLogUnit) =>
  `${Number(amount.toFixed(2))} ${unitNames[unit]}`;

export const unitName = (unit: DyeLogUnit) => unitNames[unit];

export const clockTime = (iso: string) =>
  new Date(iso).toLocaleTimeString('en-US', { hour: 'numeric', minute: '2-digit' });

/** How an entry reads in the list: voided, corrected, as planned or adjusted. */
export function entryStatus(entry: DyeLogEntry): string {
  if (entry.supersededById) return 'replaced by a correction';
  if (entry.supersedesId) return entry.amount === 0 ? 'voided' : 'corrected';
  return entry.asPlanned ? 'as planned' : 'adjusted';
}

/** Reads a typed amount: a number from 0 up, or null when it is not one. */
export function parseAmount(text: string): number | null {
  if (text.trim() === '') return null;
  const value = Number(text);
  return Number.isFinite(value) && value >= 0 ? value : null;
}
