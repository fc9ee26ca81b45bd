"use client";

import type { InputHTMLAttributes, ReactNode, TextareaHTMLAttributes } from "react";
import { useFormStatus } from "react-dom";

export type FormState =
  | { ok: true; message?: string; data?: Record<string, unknown> }
  | { ok: false; code: string; message: string; fields?: Record<string, string>; values?: Record<string, string> }
  | null;

/** The error a state holds for one field, if any. */
export function fieldError(state: FormState, name: string): string | undefined {
  return state && !state.ok ? state.fields?.[name] : undefined;
}

/** Label, control, hint and error of one field, wired for screen readers. */
function FieldFrame({ id, label, hint, error, children }: { id: string; label: string; hint?: ReactNode; error?: string; children: ReactNode }) {
  return (
    <div className="grid gap-1">
      <label htmlFor={id} className="text-small font-medium">
        {label}
      </label>
      {children}
      {hint ? (
        <p id={`${id}-hint`} className="text-micro text-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-small text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** What a field shows from the form's state: its error, what was typed, and its aria wiring. */
function fieldWiring(id: string, name: string, hint: ReactNode, state: FormState | undefined) {
  const error = fieldError(state ?? null, name);
  const typed = state && !state.ok ? state.values?.[name] : undefined;
  const described = [hint ? `${id}-hint` : "", error ? `${id}-error` : ""].filter(Boolean).join(" ") || undefined;
  return { error, typed, aria: { "aria-invalid": error ? true : undefined, "aria-describedby": described } };
}

const CONTROL = "rounded-chip border border-line bg-canvas px-3 py-2 text-body outline-none focus:border-accent aria-[invalid=true]:border-danger";

/**
 * A labelled input with its hint and its error underneath, wired for screen readers. Given the
 * form's state, it shows that field's error and keeps what was typed after a refusal.
 */
export function Field({ label, name, hint, state, ...input }: { label: string; name: string; hint?: ReactNode; state?: FormState } & InputHTMLAttributes<HTMLInputElement>) {
  const id = input.id ?? `f-${name}`;
  const { error, typed, aria } = fieldWiring(id, name, hint, state);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      <input id={id} name={name} {...aria} className={CONTROL} {...(typed !== undefined && input.type !== "password" ? { defaultValue: typed } : {})} {...input} />
    </FieldFrame>
  );
}

/** A labelled multi-line text field, like Field. */
export function TextAreaField({ label, name, hint, state, ...area }: { label: string; name: string; hint?: ReactNode; state?: FormState } & TextareaHTMLAttributes<HTMLTextAreaElement>) {
  const id = area.id ?? `f-${name}`;
  const { error, typed, aria } = fieldWiring(id, name, hint, state);
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      <textarea id={id} name={name} rows={3} {...aria} className={CONTROL} {...(typed !== undefined ? { defaultValue: typed } : {})} {...area} />
    </FieldFrame>
  );
}

/** A submit button that shows it is busy while its form's action runs. */
export function SubmitButton({ children, tone = "primary", className = "", ...rest }: { children: ReactNode; tone?: "primary" | "quiet" | "danger"; className?: string } & InputHTMLAttributes<HTMLButtonElement>) {
  const { pending } = useFormStatus();
  const tones = {
    primary: "bg-accent text-accent-ink hover:opacity-90",
    quiet: "border border-line bg-surface text-ink hover:bg-sunken",
    danger: "border border-danger/40 bg-surface text-danger hover:bg-danger/10",
  };
  return (
    <button
      type="submit"
      disabled={pending}
      aria-disabled={pending}
      className={`rounded-chip px-3 py-2 text-small font-semibold transition-opacity disabled:opacity-60 ${tones[tone]} ${className}`}
      {...(rest as object)}
    >
      {pending ? "Working…" : children}
    </button>
  );
}

/** The form's overall result: an error in the danger colour, or a confirmation. */
export function FormMessage({ state }: { state: FormState }) {
  if (!state) return null;
  if (!state.ok) {
    return (
      <p role="alert" className="rounded-chip border border-danger/40 bg-danger/10 px-3 py-2 text-small text-danger">
        {state.message}
      </p>
    );
  }
  return state.message ? (
    <p role="status" className="rounded-chip border border-ok/40 bg-ok/10 px-3 py-2 text-small text-ok">
      {state.message}
    </p>
  ) : null;
}

