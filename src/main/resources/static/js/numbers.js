// Numbers and words as a page shows and reads them: typed decimals (a comma taken as the decimal
// mark), rounding to a number of places, the one-decimal style of the summary, messages with {0}
// placeholders, and the text forms of number and corner lists that the design page's fields use.

/** A value rounded to the given number of decimal places. */
export function round(value, places) {
  const factor = 10 ** places;
  return Math.round(value * factor) / factor;
}

/** A whole number when it is one, else one decimal, as the server writes the summary. */
export function oneDecimal(value) {
  const rounded = round(value, 1);
  return Number.isInteger(rounded) ? String(rounded) : rounded.toFixed(1);
}

/**
 * A typed decimal as a number (a comma is taken as the decimal mark); anything else stays the
 * text as typed, so that the server names what is wrong with it.
 */
export function parseDecimal(value) {
  const cleaned = String(value).trim().replace(',', '.');
  const parsed = Number(cleaned);
  return cleaned !== '' && Number.isFinite(parsed) ? parsed : value;
}

/** A message with its {0}, {1}, ... placeholders filled; a placeholder without a value stays. */
export function fill(template, ...values) {
  return (template || '').replace(/\{(\d+)\}/g, (m, i) => (values[i] !== undefined ? String(values[i]) : m));
}

/** "2, 3.5, 5" as [2, 3.5, 5]; blanks are skipped, anything else becomes NaN for the server to refuse. */
export function parseNumberList(text) {
  return text.split(',').map((s) => s.trim()).filter((s) => s !== '').map(Number);
}

/**
 * Areas written one per line as corners "x y; x y; x y" (a comma may separate x and y) as
 * [[[x, y], ...], ...]; blank lines are skipped.
 */
export function parseCornerLines(text) {
  return text.split('\n').map((line) => line.trim()).filter((line) => line !== '').map((line) =>
    line.split(';').map((p) => p.trim()).filter((p) => p !== '').map((p) => p.split(/[\s,]+/).map(Number)));
}

/** One corner as the corner lines write it. */
export function cornerText(x, y) {
  return x.toFixed(2) + ' ' + y.toFixed(2);
}
