/**
 * A range copied out as tab-separated text, as a spreadsheet reads it: each cell as the grid
 * shows it in the person's units, without thousands separators (a spreadsheet or a paste back
 * into the grid reads "1234.5", not "1,234.5"), blank where the cell has no value of its own
 * (an inherited override copies as blank, so pasting it back keeps it inheriting).
 */

/** A cell's text: its shown (formatted) form, or "" when it holds no value. */
export function copyText(raw: unknown, shown: string | null | undefined): string {
  if (raw === null || raw === undefined || raw === "") return "";
  const text = shown ?? String(raw);
  return typeof raw === "number" ? text.replace(/,/g, "") : text;
}

/** A cell quoted only when it holds a tab, a line break or starts with a quote (as spreadsheets do). */
export function tsvCell(text: string): string {
  return /[\t\r\n]|^"/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Lines of tab-separated cells, the headings first when given. */
export function toTsv(cells: readonly (readonly string[])[], headings?: readonly string[]): string {
  const lines = headings ? [headings, ...cells] : cells;
  return lines.map((l) => l.map(tsvCell).join("\t")).join("\n");
}
