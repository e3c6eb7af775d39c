// Browser-side calls to the app's JSON API: errors come back as ApiError with the server's code,
// message and field paths. TanStack Query keys mirror the API paths (see `apiKey`).
import type { ErrorCode, FieldError } from "./errors";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | "network",
    message: string,
    readonly fields: FieldError[] = [],
    /** the whole error object the server sent (extra facts such as `latest` on a version conflict) */
    readonly detail: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }

  /** The message for one field path, if the server named it. */
  field(path: string): string | undefined {
    return this.fields.find((f) => f.path === path)?.message;
  }
}

/** `/api/workspaces/abc/members` → `["api", "workspaces", "abc", "members"]`. */
export function apiKey(path: string): string[] {
  return path.split("?")[0].split("/").filter(Boolean);
}

export async function apiFetch<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: init.method ?? "GET",
      headers: init.body !== undefined ? { "content-type": "application/json" } : undefined,
      body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
      credentials: "same-origin",
      cache: "no-store",
    });
  } catch {
    throw new ApiError(0, "network", "The app could not be reached. Check the connection and try again.");
  }
  const text = await res.text();
  const data = text ? safeJson(text) : null;
  if (!res.ok) {
    const err = (data as { error?: { code?: ErrorCode; message?: string; fields?: FieldError[] } & Record<string, unknown> } | null)?.error;
    throw new ApiError(res.status, err?.code ?? "internal", err?.message ?? `The server answered ${res.status}.`, err?.fields ?? [], err ?? {});
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
