import { celsiusToFahrenheit, convert } from '@vatside/dye-kit';

const threeDigits = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 3 });
const upToTwoDecimals = new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 });

/** "100 mL", "2.5 mL", "3.2 L": a measuring cup's precision, no more. */
export function formatVolume(mL: number): string {
  return mL >= 1000 ? `${threeDigits.format(mL / 1000)} L` : `${threeDigits.format(mL)} mL`;
}

export function formatGrams(g: number): string {
  return `${threeDigits.format(g)} g`;
}

export function formatOunces(g: number): string {
  return `${upToTwoDecimals.format(convert(g, 'g', 'oz'))} oz`;
}

/** Both scales side by side: "85 °C · 185 °F". */
export function formatTemperature(celsius: number): string {
  return `${Math.round(celsius)} °C · ${Math.round(celsiusToFahrenheit(celsius))} °F`;
}

const clockTime = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });
export const formatClockTime = (atMs: number) => clockTime.format(atMs);
