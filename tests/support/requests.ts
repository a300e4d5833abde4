/**
 * Requests and route contexts for calling Next route handlers and server
 * actions directly, as the framework would.
 */

export const TEST_ORIGIN = "http://ironquill.test";

/**
 * A request with a JSON body (none when `body` is undefined). A string body
 * is sent as it is, so a test can send broken JSON.
 *
 * @example
 * await route.POST(request("POST", "/api/recipes", { title: "Oat bowl" }));
 */
export function request(method: string, path: string, body?: unknown, origin = TEST_ORIGIN): Request {
  return new Request(origin + path, {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}

export const post = (path: string, body: unknown) => request("POST", path, body);

/** A bare GET, as a browser sends it: no body and no content type. */
export const get = (path: string) => new Request(TEST_ORIGIN + path);

/** The second argument of a dynamic route's handler. */
export const params = <T extends object>(p: T) => ({ params: Promise.resolve(p) });

/** `params` of a route whose only segment is `[id]`. */
export const idParams = (id: string) => params({ id });

/** The FormData a server action receives from a submitted form. */
export function form(fields: Record<string, string>): FormData {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.append(k, v);
  return f;
}
