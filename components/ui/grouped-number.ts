/**
 * "1,234.5": a number with thousands separators and a fixed count of decimals, in US English.
 * One Intl.NumberFormat per count of decimals, made once: `toLocaleString` with options builds a
 * new formatter on every call, which cost the design editor about 20 ms per keystroke across its
 * result tables (hundreds of numbers).
 */
const formats = new Map<number, Intl.NumberFormat>();

export function groupedNumber(value: number, decimals: number): string {
  let format = formats.get(decimals);
  if (!format) {
    format = new Intl.NumberFormat("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formats.set(decimals, format);
  }
  return format.format(value);
}
