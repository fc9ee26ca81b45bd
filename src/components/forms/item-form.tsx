"use client";

import { useState, type FormEvent, type ReactNode } from "react";
import { numberProblem, unitSuffix, type NumberSpec, type Option } from "@/schemas/schedule-fields";
import { decimals } from "@/units/format";
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from "@/units/units";
import { ApiError } from "@/components/schedule/api-client";

export type FieldDef =
  | { name: string; label: string; kind: "text"; hint?: string }
  | { name: string; label: string; kind: "number"; spec: NumberSpec; hint?: string }
  // A select's hint may follow the option chosen (a design case's kind).
  | { name: string; label: string; kind: "select"; options: readonly Option[]; hint?: string | ((value: string) => string) };

export type FieldErrors = Record<string, string>;

/** A stored (SI) value as the input shows it. */
export function shownValue(f: FieldDef, v: unknown, system: UnitSystem): string {
  if (v === null || v === undefined) return "";
  if (f.kind !== "number") return String(v);
  const shown = toDisplay(f.spec.quantity, v as number, system);
  return String(Number(shown.toFixed(decimals(f.spec.quantity, f.spec.digits, system) + 2)));
}

/** What the form's inputs hold, back in SI, with the problems found before asking the server. */
export function readFields(fields: readonly FieldDef[], form: FormData, system: UnitSystem, prefix = ""): { values: Record<string, unknown>; errors: FieldErrors } {
  const values: Record<string, unknown> = {};
  const errors: FieldErrors = {};
  for (const f of fields) {
    const raw = String(form.get(prefix + f.name) ?? "").trim();
    if (f.kind !== "number") {
      values[f.name] = raw;
      continue;
    }
    const n = raw === "" ? null : Number(raw);
    if (n !== null && !Number.isFinite(n)) {
      errors[f.name] = `${f.spec.label} must be a number`;
      continue;
    }
    const si = n === null ? null : fromDisplay(f.spec.quantity, n, system);
    const problem = numberProblem(f.spec, si, system);
    if (problem) errors[f.name] = problem;
    values[f.name] = si;
  }
  return { values, errors };
}

/** Field errors from a refused save (the server names each field). */
export function serverErrors(error: unknown, prefix = ""): { message: string; fields: FieldErrors } {
  if (!(error instanceof ApiError)) return { message: (error as Error).message, fields: {} };
  const fields: FieldErrors = {};
  for (const d of error.details) fields[d.field.replace(/^body\./, "").replace(prefix, "")] ??= d.message;
  return { message: error.message, fields };
}

/** The inputs of a list of fields, labelled with their units, each with its error underneath. */
export function FieldInputs({ fields, values, errors, system, idPrefix, disabled }: { fields: readonly FieldDef[]; values: Record<string, unknown>; errors: FieldErrors; system: UnitSystem; idPrefix: string; disabled: boolean }) {
  // The inputs stay uncontrolled; only the selects' choices are followed, for their hints.
  const [chosen, setChosen] = useState<Record<string, string>>({});
  const selected = (f: Extract<FieldDef, { kind: "select" }>) => chosen[f.name] ?? String(values[f.name] ?? f.options[0]?.value ?? "");
  return (
    <>
      {fields.map((f) => {
        const id = `${idPrefix}-${f.name}`;
        const error = errors[f.name];
        const unit = f.kind === "number" ? unitLabel(f.spec.quantity, system) : "";
        const control = "w-full rounded-chip border border-line bg-canvas px-2 py-1.5 text-small outline-none focus:border-accent aria-[invalid=true]:border-danger";
        return (
          <div key={f.name} className="grid content-start gap-1">
            <label htmlFor={id} className="text-micro font-medium text-muted">
              {f.label}
              {unit ? ` (${unit})` : ""}
            </label>
            {f.kind === "select" ? (
              <select
                id={id}
                name={f.name}
                defaultValue={String(values[f.name] ?? "")}
                onChange={(e) => setChosen((c) => ({ ...c, [f.name]: e.target.value }))}
                disabled={disabled}
                className={control}
                aria-invalid={error ? true : undefined}
              >
                {f.options.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
            ) : (
              <input
                id={id}
                name={f.name}
                defaultValue={shownValue(f, values[f.name], system)}
                inputMode={f.kind === "number" ? "decimal" : undefined}
                placeholder={f.kind === "number" && f.spec.blank ? `blank = ${f.spec.blank}` : undefined}
                disabled={disabled}
                aria-invalid={error ? true : undefined}
                aria-describedby={error ? `${id}-error` : undefined}
                className={control}
              />
            )}
            {error ? (
              <p id={`${id}-error`} className="text-micro text-danger">
                {error}
              </p>
            ) : f.hint ? (
              <p className="text-micro text-muted">{typeof f.hint === "function" ? f.hint(f.kind === "select" ? selected(f) : "") : f.hint}</p>
            ) : null}
          </div>
        );
      })}
    </>
  );
}

/** A card holding one item's form: title, fields, and its buttons; `key` it by version so a save refreshes it. */
export function ItemCard({ title, children, actions, onSubmit, message }: { title: ReactNode; children: ReactNode; actions: ReactNode; onSubmit: (e: FormEvent<HTMLFormElement>) => void; message?: { tone: "error" | "ok"; text: string } | null }) {
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 rounded-panel border border-line bg-surface p-4 shadow-panel">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-body font-semibold">{title}</h2>
        <div className="flex gap-2">{actions}</div>
      </div>
      {children}
      {message ? (
        <p role={message.tone === "error" ? "alert" : "status"} className={`text-small ${message.tone === "error" ? "text-danger" : "text-ok"}`}>
          {message.text}
        </p>
      ) : null}
    </form>
  );
}

export const unitOf = (spec: NumberSpec, system: UnitSystem) => unitSuffix(spec.quantity, system).trim();

/** Form state for one item's save: pending, message and field errors. */
export function useSaveState() {
  const [errors, setErrors] = useState<FieldErrors>({});
  const [message, setMessage] = useState<{ tone: "error" | "ok"; text: string } | null>(null);
  return { errors, setErrors, message, setMessage };
}
