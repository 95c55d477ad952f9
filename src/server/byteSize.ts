const factors: Record<string, number> = { B: 1, kB: 1e3, MB: 1e6, KiB: 1024, MiB: 1024 * 1024 };

/** Reads a size written with its unit: "512kB", "16MiB", "4000000B". Units: bytes */
export function parseByteSize(text: string): number {
  const match = /^\s*(\d+(?:\.\d+)?)\s*(B|kB|MB|KiB|MiB)\s*$/.exec(text);
  const bytes = match ? Math.round(Number(match[1]) * factors[match[2]!]!) : NaN;
  if (!(bytes >= 1)) throw new RangeError(`"${text}" is not a size: write it with a unit, e.g. 16MiB or 512kB`);
  return bytes;
}
