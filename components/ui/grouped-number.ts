/**
 * "1,234.5": a number with thousands separators and a fixed count of decimals, in US English,
 * exactly as Intl.NumberFormat("en-US") writes it — the number's shortest decimal form (what
 * `String(n)` gives) rounded half away from zero — but without making a formatter: the first one
 * a page makes loads the browser's locale data, tens of milliseconds the design editor spent
 * before its first paint. (`toLocaleString` with options, earlier, built a new formatter on every
 * call: about 20 ms per keystroke across the result tables.) The few numbers `String` writes in
 * exponent form (under 1e-6, 1e21 and over), infinities, NaN and −0 still go through one cached
 * Intl.NumberFormat per count of decimals.
 */
const formats = new Map<number, Intl.NumberFormat>();

export function groupedNumber(value: number, decimals: number): string {
  const abs = Math.abs(value);
  if ((abs === 0 ? !Object.is(value, -0) : abs >= 1e-6 && abs < 1e21) && Number.isInteger(decimals) && decimals >= 0 && decimals <= 20) {
    return (value < 0 ? "-" : "") + withCommas(roundedDecimal(String(abs), decimals));
  }
  let format = formats.get(decimals);
  if (!format) {
    format = new Intl.NumberFormat("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formats.set(decimals, format);
  }
  return format.format(value);
}

/** "6594.445" to 2 decimals → "6594.45" (half away from zero, on the decimal digits themselves). */
function roundedDecimal(plain: string, decimals: number): string {
  const dot = plain.indexOf(".");
  const whole = dot < 0 ? plain : plain.slice(0, dot);
  const frac = dot < 0 ? "" : plain.slice(dot + 1);
  if (frac.length <= decimals) return decimals === 0 ? whole : `${whole}.${frac.padEnd(decimals, "0")}`;
  let digits = whole + frac.slice(0, decimals);
  if (frac.charCodeAt(decimals) >= 53) {
    // Add one in the last kept place, carrying left ("999.995" → "1000.00").
    let i = digits.length - 1;
    while (i >= 0 && digits[i] === "9") i--;
    digits = i < 0 ? `1${"0".repeat(digits.length)}` : digits.slice(0, i) + String.fromCharCode(digits.charCodeAt(i) + 1) + "0".repeat(digits.length - i - 1);
  }
  const wholeDigits = digits.length - decimals;
  return decimals === 0 ? digits : `${digits.slice(0, wholeDigits)}.${digits.slice(wholeDigits)}`;
}

/** "1234567.50" → "1,234,567.50": commas in the whole part only. */
function withCommas(fixed: string): string {
  const dot = fixed.indexOf(".");
  const end = dot < 0 ? fixed.length : dot;
  if (end <= 3) return fixed;
  const head = ((end - 1) % 3) + 1;
  let out = fixed.slice(0, head);
  for (let i = head; i < end; i += 3) out += "," + fixed.slice(i, i + 3);
  return out + fixed.slice(end);
}
