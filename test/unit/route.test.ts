// route(): input parsing with zod and the one mapping from errors to HTTP statuses.
import { afterEach, describe, expect, test, vi } from "vitest";
import { z } from "zod";
import { AppError, ERROR_STATUS, type AppErrorCode } from "@/server/http/app-error";
import { route } from "@/server/http/route";

const post = (body: string, headers: Record<string, string> = {}) =>
  new Request("http://test/api/things", { method: "POST", body, headers: { "content-type": "application/json", ...headers } });
const params = (p: Record<string, string>) => ({ params: Promise.resolve(p) });

afterEach(() => vi.restoreAllMocks());

describe("AppError codes map to HTTP statuses in one place", () => {
  test.each([
    ["bad_request", 400],
    ["invalid_input", 422],
    ["unauthenticated", 401],
    ["plan_limit", 402],
    ["forbidden", 403],
    ["cross_site_request", 403],
    ["not_found", 404],
    ["conflict", 409],
    ["gone", 410],
    ["payload_too_large", 413],
    ["too_many_requests", 429],
    ["unavailable", 503],
    ["internal", 500],
  ] as [AppErrorCode, number][])("%s → %i", async (code, status) => {
    expect(ERROR_STATUS[code]).toBe(status);
    const handler = route({ auth: "public" }, () => {
      throw new AppError(code, `failed with ${code}`);
    });
    const res = await handler(new Request("http://test/x"));
    expect(res.status).toBe(status);
    expect(await res.json()).toEqual({ error: { code, message: `failed with ${code}` } });
  });
});

describe("input parsing", () => {
  const ZThing = z.object({ name: z.string().min(1), width_m: z.number().positive() });
  const create = route({ auth: "public", body: ZThing }, ({ body }) => ({ created: body.name }));

  test("a valid body reaches the handler and its return value becomes JSON", async () => {
    const res = await create(post(JSON.stringify({ name: "North wall", width_m: 4.2 })));
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ created: "North wall" });
  });

  test("a body that fails its schema is 422 with the fields named", async () => {
    const res = await create(post(JSON.stringify({ name: "", width_m: -1 })));
    expect(res.status).toBe(422);
    const { error } = await res.json();
    expect(error.code).toBe("invalid_input");
    expect(error.details.map((d: { field: string }) => d.field)).toEqual(["body.name", "body.width_m"]);
  });

  test("a route can choose 400 for invalid input, as a contract may require", async () => {
    const strict = route({ auth: "public", body: ZThing, invalidStatus: 400 }, () => ({}));
    const res = await strict(post(JSON.stringify({ name: 3 })));
    expect(res.status).toBe(400);
    expect((await res.json()).error.code).toBe("bad_request");
  });

  test("malformed JSON is 400", async () => {
    const res = await create(post("{not json"));
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatchObject({ code: "bad_request", message: "Body is not valid JSON" });
  });

  test("a body over the size limit is 413", async () => {
    const small = route({ auth: "public", body: ZThing, maxBodyBytes: 16 }, () => ({}));
    const res = await small(post(JSON.stringify({ name: "a long name for a wall", width_m: 1 })));
    expect(res.status).toBe(413);
  });

  test("params and query are validated too", async () => {
    const show = route({ auth: "public", params: z.object({ projectId: z.uuid() }), query: z.object({ case: z.enum(["winter", "summer"]) }) }, ({ params, query }) => ({
      id: params.projectId,
      case: query.case,
    }));
    const id = "5b0c6f0e-9a55-4c1e-8a5d-0f4f0a3c2b11";
    const ok = await show(new Request(`http://test/p?case=winter`), params({ projectId: id }));
    expect(await ok.json()).toEqual({ id, case: "winter" });
    const badParam = await show(new Request(`http://test/p?case=winter`), params({ projectId: "nope" }));
    expect(badParam.status).toBe(422);
    const badQuery = await show(new Request(`http://test/p?case=spring`), params({ projectId: id }));
    expect(badQuery.status).toBe(422);
  });

  test("a ZodError thrown inside a handler is mapped like invalid input", async () => {
    const handler = route({ auth: "public" }, () => z.object({ n: z.number() }).parse({ n: "x" }));
    expect((await handler(new Request("http://test/x"))).status).toBe(422);
  });

  test("an unexpected error is 500 without leaking its message", async () => {
    vi.spyOn(console, "error").mockImplementation(() => {});
    const handler = route({ auth: "public" }, () => {
      throw new Error("connection string with a password");
    });
    const res = await handler(new Request("http://test/x"));
    expect(res.status).toBe(500);
    expect(JSON.stringify(await res.json())).not.toContain("password");
  });

  test("an unexpected error answers a generic message and a request id; the log has the details under that id", async () => {
    const logged = vi.spyOn(console, "error").mockImplementation(() => {});
    const handler = route({ auth: "public" }, () => {
      throw new Error('relation "firm_billing" does not exist at /srv/filmsheet/node_modules/pg');
    });
    const res = await handler(new Request("http://test/api/things"));
    expect(res.status).toBe(500);
    const body = await res.json();
    const id = res.headers.get("x-request-id");
    expect(id).toMatch(/^[0-9a-f-]{36}$/);
    expect(body).toEqual({ error: { code: "internal", message: `Something went wrong on our side. If it happens again, quote reference ${id}.`, details: { requestId: id } } });
    expect(JSON.stringify(body)).not.toMatch(/firm_billing|node_modules|relation/);
    expect(logged).toHaveBeenCalledTimes(1);
    expect(String(logged.mock.calls[0]![0])).toBe(`[${id}] GET /api/things failed:`);
    expect((logged.mock.calls[0]![1] as Error).message).toContain('relation "firm_billing" does not exist');
  });

  test("the id a proxy gave the request (X-Request-Id) is kept; a malformed one is replaced", async () => {
    vi.spyOn(console, "error").mockImplementation(() => {});
    const handler = route({ auth: "public" }, () => {
      throw new Error("boom");
    });
    const given = await handler(new Request("http://test/x", { headers: { "x-request-id": "lb-4f2a9c1e-77" } }));
    expect(given.headers.get("x-request-id")).toBe("lb-4f2a9c1e-77");
    const forged = await handler(new Request("http://test/x", { headers: { "x-request-id": "<script>alert(1)</script>" } }));
    expect(forged.headers.get("x-request-id")).toMatch(/^[0-9a-f-]{36}$/);
  });

  test("a handler may return its own Response", async () => {
    const handler = route({ auth: "public" }, () => new Response("teapot", { status: 418 }));
    expect((await handler(new Request("http://test/x"))).status).toBe(418);
  });
});
