// action(): the server-action twin of route() — form parsing, field errors, error mapping.
import { describe, expect, test, vi } from "vitest";
import { z } from "zod";
import { AppError } from "@/server/http/app-error";
import { action, formObject } from "@/server/http/action";

const form = (entries: [string, string][]) => {
  const f = new FormData();
  for (const [k, v] of entries) f.append(k, v);
  return f;
};

describe("formObject", () => {
  test("repeated `name[]` fields become an array, empty fields are left out, Next's own are dropped", () => {
    expect(formObject(form([["email", "a@b.test"], ["roles[]", "checker"], ["roles[]", "viewer"], ["name", ""], ["$ACTION_ID_1", "x"]]))).toEqual({
      email: "a@b.test",
      roles: ["checker", "viewer"],
    });
  });
});

describe("action()", () => {
  const ZInput = z.object({ email: z.email("Enter an e-mail"), password: z.string().min(10, "Too short") });
  const save = action({ auth: "public", input: ZInput }, async ({ input }) => ({ ok: true, message: `saved ${input.email}` }));

  test("valid input reaches the handler", async () => {
    expect(await save(null, form([["email", "a@b.test"], ["password", "long-enough-pw"]]))).toEqual({ ok: true, message: "saved a@b.test" });
  });

  test("invalid input names each field, and gives back what was typed except passwords", async () => {
    const state = await save(null, form([["email", "nope"], ["password", "short"]]));
    expect(state).toEqual({
      ok: false,
      code: "invalid_input",
      message: "Check the highlighted fields",
      fields: { email: "Enter an e-mail", password: "Too short" },
      values: { email: "nope" },
    });
  });

  test("an AppError becomes its message, with field details when it has them", async () => {
    const full = action({ auth: "public" }, async () => {
      throw new AppError("conflict", "All seats are in use", [{ field: "email", message: "No free seat" }]);
    });
    expect(await full(null, form([["email", "x@y.test"]]))).toMatchObject({ ok: false, code: "conflict", message: "All seats are in use", fields: { email: "No free seat" } });
  });

  test("an unexpected error is logged and reported without its message", async () => {
    const spy = vi.spyOn(console, "error").mockImplementation(() => {});
    const broken = action({ auth: "public" }, async () => {
      throw new Error("secret detail");
    });
    const state = await broken(null, new FormData());
    expect(state).toMatchObject({ ok: false, code: "internal" });
    expect(JSON.stringify(state)).not.toContain("secret detail");
    // The person gets a reference to quote; the log has the error under the same reference.
    const id = /quote reference ([0-9a-f-]{36})/.exec((state as { message: string }).message)?.[1];
    expect(id).toBeDefined();
    expect(String(spy.mock.calls[0]![0])).toContain(id);
    expect((spy.mock.calls[0]![1] as Error).message).toBe("secret detail");
    spy.mockRestore();
  });

  test("called with the form alone (a plain form action), it still reads the form", async () => {
    const echo = action({ auth: "public", input: z.object({ n: z.string() }) }, async ({ input }) => ({ ok: true, message: input.n }));
    expect(await (echo as unknown as (f: FormData) => Promise<unknown>)(form([["n", "7"]]))).toEqual({ ok: true, message: "7" });
  });
});
