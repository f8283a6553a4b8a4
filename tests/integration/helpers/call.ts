/** Calls a route handler as Next would: a Request and, for dynamic segments, a params promise. */
export async function call<P extends Record<string, string>>(
  handler: (request: Request, context: { params: Promise<P> }) => Promise<Response>,
  url: string,
  params: P = {} as P,
  init?: RequestInit,
) {
  const response = await handler(new Request(new URL(url, 'http://localhost'), init), {
    params: Promise.resolve(params),
  });
  const body = response.headers.get('content-type')?.includes('json') ? await response.json() : await response.text();
  return { status: response.status, body };
}

/** A RequestInit carrying a JSON body. */
export const jsonBody = (method: 'POST' | 'PATCH' | 'PUT' | 'DELETE', body: unknown): RequestInit => ({
  method,
  headers: { 'content-type': 'application/json' },
  body: typeof body === 'string' ? body : JSON.stringify(body),
});
