"use client";

import { useEffect, useId, useState } from "react";
import type { TSheet } from "@/schemas/schedule";
import { MAX_COLUMN_SETS } from "@/schemas/preferences-defaults";
import { BUILT_IN_SETS, BUILT_IN_TITLES, DEFAULT_SET, gridColumns, isBuiltInSet, visibleColumns, type ColumnSet } from "@/schedule/column-sets";
import { usePreferences } from "@/components/schedule/use-preferences";
import { useProject } from "@/components/schedule/schedule-context";

const button = "rounded-chip border border-line bg-surface px-2.5 py-1 text-small font-medium hover:bg-sunken disabled:opacity-50";
const GROUPS = [
  { group: "input", title: "Inputs" },
  { group: "result", title: "Results" },
  { group: "other", title: "Other" },
] as const;

/** A new set's id: short, unique enough for one person's few dozen sets. */
const newId = () => `set-${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

/**
 * Which columns the sheet shows: the built-in sets (inputs, results, everything) and the person's
 * own, which they make here (pick columns, name, save) and delete. Saved with their view settings.
 */
export function ColumnSetPicker({ sheet }: { sheet: TSheet }) {
  const { notify } = useProject();
  const { prefs, update } = usePreferences((m) => notify({ tone: "error", message: `Column set not saved: ${m}` }));
  const own = prefs.column_sets.filter((s) => s.sheet === sheet);
  const active = prefs.active_column_sets[sheet] ?? DEFAULT_SET;
  const mine = own.find((s) => s.id === active);
  const [editing, setEditing] = useState(false);
  const selectId = useId();

  return (
    <div className="relative flex flex-wrap items-center gap-2">
      <label htmlFor={selectId} className="text-micro font-medium text-muted">
        Columns
      </label>
      <select
        id={selectId}
        aria-label="Column set"
        value={mine || isBuiltInSet(active) ? active : DEFAULT_SET}
        onChange={(e) => update({ active_column_sets: { [sheet]: e.target.value } })}
        className="rounded-chip border border-line bg-canvas px-2 py-1 text-small"
      >
        <optgroup label="Built in">
          {BUILT_IN_SETS.map((s) => (
            <option key={s} value={s}>
              {BUILT_IN_TITLES[s]}
            </option>
          ))}
        </optgroup>
        {own.length ? (
          <optgroup label="Yours">
            {own.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </optgroup>
        ) : null}
      </select>
      <button type="button" className={button} aria-expanded={editing} onClick={() => setEditing((v) => !v)}>
        {mine ? "Edit set…" : "New set…"}
      </button>
      {editing ? (
        <ColumnSetEditor
          key={`${sheet}:${active}`}
          sheet={sheet}
          start={[...visibleColumns(sheet, active, own)]}
          mine={mine}
          taken={own.filter((s) => s.id !== mine?.id).map((s) => s.name.toLowerCase())}
          full={prefs.column_sets.length >= MAX_COLUMN_SETS}
          onClose={() => setEditing(false)}
          onSave={(set) => {
            const others = prefs.column_sets.filter((s) => s.id !== set.id);
            update({ column_sets: [...others, set], active_column_sets: { [sheet]: set.id } });
            setEditing(false);
          }}
          onDelete={(id) => {
            update({ column_sets: prefs.column_sets.filter((s) => s.id !== id), active_column_sets: { [sheet]: DEFAULT_SET } });
            setEditing(false);
          }}
        />
      ) : null}
    </div>
  );
}

function ColumnSetEditor(props: {
  sheet: TSheet;
  start: string[];
  mine: ColumnSet | undefined;
  taken: string[];
  full: boolean;
  onClose: () => void;
  onSave: (set: ColumnSet) => void;
  onDelete: (id: string) => void;
}) {
  const [picked, setPicked] = useState(() => new Set(props.start));
  const [name, setName] = useState(props.mine?.name ?? "");
  const [error, setError] = useState<string | null>(null);
  const columns = gridColumns(props.sheet);
  const { onClose } = props;
  useEffect(() => {
    const esc = (e: KeyboardEvent) => e.key === "Escape" && onClose();
    window.addEventListener("keydown", esc);
    return () => window.removeEventListener("keydown", esc);
  }, [onClose]);

  const save = (asNew: boolean) => {
    const n = name.trim();
    if (!n) return setError("Name the set");
    if (isBuiltInSet(n.toLowerCase())) return setError(`"${n}" is a built-in set's name`);
    const clash = asNew ? [...props.taken, ...(props.mine ? [props.mine.name.toLowerCase()] : [])] : props.taken;
    if (clash.includes(n.toLowerCase())) return setError(`You already have a set named "${n}"`);
    if (asNew && props.full) return setError("You have as many sets as can be kept: delete one first");
    // Grid order, whatever order they were ticked in; the label is always shown.
    const ids = columns.map((c) => c.id).filter((id) => id === "label" || picked.has(id));
    props.onSave({ id: asNew || !props.mine ? newId() : props.mine.id, name: n, sheet: props.sheet, columns: ids });
  };

  return (
    <div role="dialog" aria-label="Column set" className="absolute right-0 top-full z-20 mt-1 grid w-[min(44rem,90vw)] gap-3 rounded-panel border border-line bg-surface p-4 text-small shadow-panel">
      <div className="grid gap-3 sm:grid-cols-3">
        {GROUPS.map((g) => (
          <fieldset key={g.group} className="grid content-start gap-1">
            <legend className="mb-1 font-semibold">{g.title}</legend>
            {columns
              .filter((c) => c.group === g.group)
              .map((c) => (
                <label key={c.id} className="flex items-center gap-2">
                  <input
                    type="checkbox"
                    checked={c.id === "label" || picked.has(c.id)}
                    disabled={c.id === "label"}
                    onChange={(e) =>
                      setPicked((p) => {
                        const next = new Set(p);
                        if (e.target.checked) next.add(c.id);
                        else next.delete(c.id);
                        return next;
                      })
                    }
                  />
                  {c.title}
                </label>
              ))}
          </fieldset>
        ))}
      </div>
      <div className="flex flex-wrap items-end gap-2 border-t border-line pt-3">
        <label className="grid gap-0.5 text-micro font-medium text-muted">
          Set name
          <input value={name} maxLength={60} onChange={(e) => (setName(e.target.value), setError(null))} className="rounded-chip border border-line bg-canvas px-2 py-1 text-small text-ink" />
        </label>
        {props.mine ? (
          <button type="button" className={button} onClick={() => save(false)}>
            Save changes
          </button>
        ) : null}
        <button type="button" className={button} onClick={() => save(true)}>
          Save as new set
        </button>
        {props.mine ? (
          <button type="button" className={`${button} text-danger`} onClick={() => props.onDelete(props.mine!.id)}>
            Delete set
          </button>
        ) : null}
        <button type="button" className="ml-auto px-2 py-1 text-small underline" onClick={props.onClose}>
          Close
        </button>
      </div>
      {error ? (
        <p role="alert" className="text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
