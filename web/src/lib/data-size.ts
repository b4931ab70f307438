/** A size in bytes as a phone's owner reads it: "0.4 MB", "38 MB", "10.7 GB" (decimal units, as phones show them). */
export function dataSize(bytes: number): string {
  const mb = bytes / 1e6;
  if (mb >= 1000) return `${(mb / 1000).toFixed(1)} GB`;
  return mb < 0.1 && bytes > 0 ? '0.1 MB' : mb < 10 ? `${mb.toFixed(1)} MB` : `${Math.round(mb)} MB`;
}
