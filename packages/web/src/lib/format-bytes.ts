const oneDecimal = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 1 });
const whole = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });

/** A size in bytes for people, in decimal (SI) multiples: "512 B", "1.8 kB", "2.4 MB". */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return '—';
  if (bytes < 1000) return `${whole.format(bytes)} B`;
  if (bytes < 1_000_000) return `${oneDecimal.format(bytes / 1000)} kB`;
  return `${oneDecimal.format(bytes / 1_000_000)} MB`;
}
