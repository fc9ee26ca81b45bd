/**
 * A rectangular range of grid cells, in display positions (the row's index as sorted and
 * filtered, the column's index among the shown columns), and how it is drawn: the community grid
 * has no range selection, so the range is one small model here and one generated stylesheet that
 * paints the cells by the grid's own `row-index` and `col-id` attributes (so it survives virtual
 * scrolling and needs no cell refresh).
 */
export interface CellPos {
  row: number;
  col: number;
}

/** The anchor stays where the selection began (the focused cell); the focus is the far corner. */
export interface CellRange {
  anchor: CellPos;
  focus: CellPos;
}

export interface Bounds {
  top: number;
  bottom: number;
  left: number;
  right: number;
}

export type Direction = "up" | "down" | "left" | "right";

export const singleCell = (c: CellPos): CellRange => ({ anchor: c, focus: c });

export function boundsOf(r: CellRange): Bounds {
  return {
    top: Math.min(r.anchor.row, r.focus.row),
    bottom: Math.max(r.anchor.row, r.focus.row),
    left: Math.min(r.anchor.col, r.focus.col),
    right: Math.max(r.anchor.col, r.focus.col),
  };
}

export const rowCount = (b: Bounds) => b.bottom - b.top + 1;
export const colCount = (b: Bounds) => b.right - b.left + 1;
export const isSingle = (b: Bounds) => rowCount(b) === 1 && colCount(b) === 1;
export const containsCell = (b: Bounds, c: CellPos) => c.row >= b.top && c.row <= b.bottom && c.col >= b.left && c.col <= b.right;

const clamp = (v: number, lo: number, hi: number) => Math.max(lo, Math.min(hi, v));

/**
 * Shift+arrow: the far corner moves one cell (or, with Ctrl/Cmd, to the sheet's edge), kept
 * inside `rows` × `cols`; the anchor stays.
 */
export function extendRange(r: CellRange, dir: Direction, size: { rows: number; cols: number }, toEdge = false): CellRange {
  const { row, col } = r.focus;
  const lastRow = size.rows - 1;
  const lastCol = size.cols - 1;
  const step = {
    up: { row: toEdge ? 0 : row - 1, col },
    down: { row: toEdge ? lastRow : row + 1, col },
    left: { row, col: toEdge ? 0 : col - 1 },
    right: { row, col: toEdge ? lastCol : col + 1 },
  }[dir];
  return { anchor: r.anchor, focus: { row: clamp(step.row, 0, Math.max(0, lastRow)), col: clamp(step.col, 0, Math.max(0, lastCol)) } };
}

/**
 * Dragging the fill handle from `source` to the cell under the pointer: the range grows down or
 * right (whichever the pointer has gone further beyond the source), never up or left, and never
 * shrinks. Null while the pointer is still inside the source.
 */
export function fillExtension(source: Bounds, over: CellPos): { bounds: Bounds; direction: "down" | "right" } | null {
  const down = over.row - source.bottom;
  const right = over.col - source.right;
  if (down <= 0 && right <= 0) return null;
  if (down >= right) return { bounds: { ...source, bottom: over.row }, direction: "down" };
  return { bounds: { ...source, right: over.col }, direction: "right" };
}

/** Every position of `target` with the source cell it copies, tiling the source block. */
export function tiledSources(source: Bounds, target: Bounds): { target: CellPos; source: CellPos }[] {
  const out: { target: CellPos; source: CellPos }[] = [];
  const h = rowCount(source);
  const w = colCount(source);
  for (let row = target.top; row <= target.bottom; row++) {
    for (let col = target.left; col <= target.right; col++) {
      if (containsCell(source, { row, col })) continue;
      out.push({ target: { row, col }, source: { row: source.top + ((row - source.top) % h + h) % h, col: source.left + ((col - source.left) % w + w) % w } });
    }
  }
  return out;
}

/** Ctrl+D copies the range's top row into the rows below it; Ctrl+R its left column rightwards. */
export function fillSource(b: Bounds, direction: "down" | "right"): Bounds {
  return direction === "down" ? { ...b, bottom: b.top } : { ...b, right: b.left };
}

const cssString = (s: string) => `"${s.replace(/["\\]/g, "\\$&")}"`;
const rowSel = (from: number, to: number) => {
  const parts: string[] = [];
  for (let i = from; i <= to; i++) parts.push(`[row-index="${i}"]`);
  return `.ag-row:not(.ag-row-pinned):is(${parts.join(",")})`;
};
const colSel = (ids: readonly string[]) => `.ag-cell:is(${ids.map((id) => `[col-id=${cssString(id)}]`).join(",")})`;

/**
 * The stylesheet that draws a range inside the element carrying `data-range-scope="<scope>"`:
 * a tint and an outline over every cell (through a pseudo-element, so error outlines and the
 * grid's focus ring still show), the fill handle on the bottom-right cell, and a dashed outline
 * over the cells a fill drag would write. A single cell gets only the handle: the grid's focus
 * ring already marks it.
 */
export function rangeCss(scope: string, b: Bounds | null, columnIds: readonly string[], preview: Bounds | null = null): string {
  if (!b || columnIds.length === 0) return "";
  const s = `[data-range-scope=${cssString(scope)}]`;
  const cols = (l: number, r: number) => colSel(columnIds.slice(l, r + 1));
  const out: string[] = [];
  const paint = (x: Bounds, style: "solid" | "dashed", tint: boolean) => {
    const area = `${s} ${rowSel(x.top, x.bottom)} ${cols(x.left, x.right)}`;
    out.push(
      `${area}::after{content:"";position:absolute;inset:0;pointer-events:none;z-index:1;` +
        `${tint ? "background:color-mix(in srgb,var(--fs-accent) 13%,transparent);" : ""}` +
        `border:0 ${style} var(--fs-accent);border-width:var(--fs-rt,0) var(--fs-rr,0) var(--fs-rb,0) var(--fs-rl,0)}`,
      `${s} ${rowSel(x.top, x.top)} ${cols(x.left, x.right)}{--fs-rt:2px}`,
      `${s} ${rowSel(x.bottom, x.bottom)} ${cols(x.left, x.right)}{--fs-rb:2px}`,
      `${s} ${rowSel(x.top, x.bottom)} ${cols(x.left, x.left)}{--fs-rl:2px}`,
      `${s} ${rowSel(x.top, x.bottom)} ${cols(x.right, x.right)}{--fs-rr:2px}`,
    );
  };
  if (preview) paint(preview, "dashed", false);
  else if (!isSingle(b)) paint(b, "solid", true);
  out.push(
    `${s} ${rowSel(b.bottom, b.bottom)} ${cols(b.right, b.right)}::before{content:"";position:absolute;right:0;bottom:0;width:7px;height:7px;` +
      `background:var(--fs-accent);outline:1px solid var(--fs-surface);z-index:2;cursor:crosshair}`,
  );
  return out.join("\n");
}

/** Whether a point (client coordinates) is on the fill handle of a cell's box. */
export function onFillHandle(cell: { right: number; bottom: number }, x: number, y: number, size = 9): boolean {
  return x >= cell.right - size && x <= cell.right + 1 && y >= cell.bottom - size && y <= cell.bottom + 1;
}
