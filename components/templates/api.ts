/**
 * Small client helpers for the template API: JSON in, JSON out, and the
 * server's closed error vocabulary turned into one readable message.
 */
export type ApiError = { code: string; message: string; fields: Record<string, string>; diagnostics?: { line: number; column: number; message: string }[] };

export class ApiFailure extends Error {
  constructor(readonly error: ApiError, readonly status: number) {
    super(error.message);
  }
}

export async function api<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  let res: Response;
  try {
    res = await fetch(url, {
      ...rest,
      headers: { ...(json !== undefined ? { "content-type": "application/json" } : {}), ...rest.headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiFailure({ code: "unavailable", message: "Could not reach Ironquill. Check your connection; nothing was lost.", fields: {} }, 0);
  }
  const body = await res.json().catch(() => null);
  if (!res.ok) {
    const err = (body as { error?: ApiError } | null)?.error;
    throw new ApiFailure(err ?? { code: "internal", message: `The server answered ${res.status}.`, fields: {} }, res.status);
  }
  return body as T;
}

/** One line for a status area: the message plus the first field or line problem. */
export function describeFailure(e: unknown): string {
  if (!(e instanceof ApiFailure)) return "Something went wrong; your text is kept here. Try again.";
  const d = e.error.diagnostics?.[0];
  if (d) return `${e.error.message} First at line ${d.line}:${d.column} — ${d.message}`;
  const field = Object.entries(e.error.fields)[0];
  return field ? `${e.error.message} (${field[0]}: ${field[1]})` : e.error.message;
}
