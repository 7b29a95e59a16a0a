import { convert } from '@vatside/dye-kit';
import { formatAmount } from '../../../lib/format.ts';

/** "8 L · 8.45 US qt (2.11 gal)"; a US gallon holds 4 quarts. */
export function capacityLabel(capacityMl: number): string {
  const gallons = convert(capacityMl, 'mL', 'gal');
  return `${formatAmount(convert(capacityMl, 'mL', 'L'))} L · ${formatAmount(gallons * 4)} US qt (${formatAmount(gallons)} gal)`;
}
