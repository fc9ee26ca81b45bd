"use client";

/** The line under the grid: the selected range's size, the keys that act on it, the copy-with-headings choice. */
export function RangeStatus(props: { size: { rows: number; cols: number } | null; headings: boolean; onHeadings: (on: boolean) => void; canEdit: boolean }) {
  const { size } = props;
  const many = size && size.rows * size.cols > 1;
  return (
    <div className="mt-1 flex flex-wrap items-center gap-x-4 gap-y-1 text-micro text-muted" data-testid="range-status">
      <span aria-live="polite" className="font-medium text-ink">
        {many ? `${size.rows} ${size.rows === 1 ? "row" : "rows"} × ${size.cols} ${size.cols === 1 ? "column" : "columns"} selected` : "Shift+arrows or drag to select cells"}
      </span>
      <span>
        Ctrl+C copies as tab-separated text in your units (Ctrl+Shift+C with headings)
        {props.canEdit ? "; Ctrl+D / Ctrl+R or the corner handle fill down / right; Delete clears; Ctrl+Z undo, Ctrl+Y redo" : ""}. On a Mac, Cmd for Ctrl.
      </span>
      <label className="inline-flex items-center gap-1">
        <input type="checkbox" checked={props.headings} onChange={(e) => props.onHeadings(e.target.checked)} />
        Copy with headings
      </label>
    </div>
  );
}
