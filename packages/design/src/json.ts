/**
 * JSON for files a checker compares byte for byte: two-space indent, a final newline, -0 written as 0,
 * and a refusal (not a silent null) for NaN and infinite numbers.
 */
export function stableJson(value: unknown): string {
  return `${JSON.stringify(
    value,
    (key, item: unknown) => {
      if (typeof item === 'number') {
        if (!Number.isFinite(item)) throw new Error(`cannot write a non-finite number (${item}) at '${key}' to JSON`);
        return Object.is(item, -0) ? 0 : item;
      }
      return item;
    },
    2,
  )}\n`;
}
