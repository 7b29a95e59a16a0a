const units = ['bytes', 'KB', 'MB', 'GB', 'TB'] as const;
const oneDecimal = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });

/** Bytes in binary steps of 1024, as file browsers show them: "12.4 MB". */
export function formatBytes(bytes: number): string {
  let value = bytes;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${unit === 0 ? value : oneDecimal.format(value)} ${units[unit]}`;
}
