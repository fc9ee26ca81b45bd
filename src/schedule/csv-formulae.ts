/**
 * CSV injection: a spreadsheet program runs a CSV cell that starts with =, +, -, @, a tab or a
 * carriage return as a formula (`=HYPERLINK(…)` becomes a live link). Exports prefix such text
 * with a single quote, as OWASP advises, so it shows as text; numbers are written as numbers and
 * never prefixed (-5 stays a number). The importer takes one quote off again so an exported file
 * comes back unchanged: text that already starts with quotes before such a character gets one
 * more on the way out, so removing one on the way in is exact.
 */
const FORMULA_LIKE = /^'*[=+\-@\t\r]/;

/** The pattern for papaparse's `escapeFormulae` (applied to strings only, never to numbers). */
export const CSV_ESCAPE_FORMULAE = FORMULA_LIKE;

/** A CSV cell as read back: one protective quote removed from text the export protected. */
export function unescapeCsvText(cell: string): string {
  return cell.startsWith("'") && FORMULA_LIKE.test(cell) ? cell.slice(1) : cell;
}
