/** The schedule API from the browser: JSON in and out, errors as ApiError with the server's details. */
export interface ErrorDetail {
  row?: number;
  sheet?: string;
  id?: string;
  field: string;
  column?: string;
  message: string;
  current?: Record<string, unknown> | null;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: ErrorDetail[] = [],
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function api<T>(method: "GET" | "POST" | "PATCH" | "DELETE", path: string, body?: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      method,
      headers: body === undefined ? {} : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "The server could not be reached; nothing was saved");
  }
  const data = await res.json().catch(() => null);
  if (!res.ok) {
    const e = data?.error ?? {};
    throw new ApiError(res.status, e.code ?? "error", e.message ?? `Request failed (${res.status})`, Array.isArray(e.details) ? e.details : []);
  }
  return data as T;
}

/** The URL segment of each item table. */
export const ITEM_PATHS = { design_cases: "design-cases", zones: "zones", buildups: "buildups", surfaces: "surfaces", duct_runs: "duct-runs" } as const;
export type ItemTable = keyof typeof ITEM_PATHS;
