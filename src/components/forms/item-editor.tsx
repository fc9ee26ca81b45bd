"use client";

import { useState, type FormEvent, type ReactNode } from "react";
import type { UnitSystem } from "@/units/units";
import { useProject } from "@/components/schedule/schedule-context";
import { useScheduleWrites } from "@/components/schedule/use-schedule-writes";
import { FieldInputs, ItemCard, readFields, serverErrors, useSaveState, type FieldDef, type FieldErrors } from "./item-form";

export interface Extra {
  render: (values: Record<string, unknown>, errors: FieldErrors, disabled: boolean, system: UnitSystem) => ReactNode;
  read: (form: FormData, system: UnitSystem) => { values: Record<string, unknown>; errors: FieldErrors };
}

const btn = "rounded-chip px-3 py-1.5 text-small font-semibold disabled:opacity-60";

/**
 * One design case, zone or build-up as a form (or a blank one to add): saved with the version
 * read, field errors shown under each field, a stale version answered with the current values.
 */
export function ItemEditor({ table, item, initial, fields, extra, title, noun, gridClass }: {
  table: "design_cases" | "zones" | "buildups";
  item: (Record<string, unknown> & { id: string; version: number }) | null;
  /** What the blank form (item null) starts with. */
  initial?: Record<string, unknown>;
  fields: readonly FieldDef[];
  extra?: Extra;
  title: ReactNode;
  noun: string;
  gridClass: string;
}) {
  const { system, canEdit } = useProject();
  const { item: save } = useScheduleWrites();
  const s = useSaveState();
  const [confirming, setConfirming] = useState(false);
  const [formKey, setFormKey] = useState(0);
  const values = item ?? initial ?? {};

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const main = readFields(fields, form, system);
    const more = extra?.read(form, system) ?? { values: {}, errors: {} };
    const errors = { ...main.errors, ...more.errors };
    s.setErrors(errors);
    if (Object.keys(errors).length) return s.setMessage({ tone: "error", text: "Not saved: fix the fields marked" });
    try {
      await save.mutateAsync({ table, op: item ? "update" : "create", id: item?.id, values: { ...main.values, ...more.values } });
      s.setMessage({ tone: "ok", text: item ? "Saved" : `${noun} added` });
      if (!item) setFormKey((k) => k + 1);
    } catch (error) {
      const { message, fields: f } = serverErrors(error);
      s.setErrors(f);
      s.setMessage({ tone: "error", text: message });
      setFormKey((k) => k + 1);
    }
  }

  async function remove() {
    try {
      await save.mutateAsync({ table, op: "delete", id: item!.id });
    } catch (error) {
      s.setMessage({ tone: "error", text: serverErrors(error).message });
      setConfirming(false);
    }
  }

  const disabled = !canEdit || save.isPending;
  const actions = canEdit ? (
    <>
      {item && confirming ? (
        <>
          <button type="button" className={`${btn} bg-danger text-accent-ink`} onClick={remove}>
            Delete {noun.toLowerCase()}
          </button>
          <button type="button" className={`${btn} border border-line`} onClick={() => setConfirming(false)}>
            Keep
          </button>
        </>
      ) : item ? (
        <button type="button" className={`${btn} border border-line text-danger`} onClick={() => setConfirming(true)}>
          Delete
        </button>
      ) : null}
      <button type="submit" className={`${btn} bg-accent text-accent-ink`} disabled={disabled}>
        {item ? "Save" : `Add ${noun.toLowerCase()}`}
      </button>
    </>
  ) : null;

  return (
    <ItemCard key={`${item?.version ?? "new"}-${formKey}-${system}`} title={title} actions={actions} onSubmit={submit} message={s.message}>
      <div className={`grid gap-3 ${gridClass}`}>
        <FieldInputs fields={fields} values={values} errors={s.errors} system={system} idPrefix={item?.id ?? `new-${table}`} disabled={!canEdit} />
      </div>
      {extra?.render(values, s.errors, !canEdit, system)}
    </ItemCard>
  );
}
