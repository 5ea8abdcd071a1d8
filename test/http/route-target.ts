// What the shared HTTP suites run against: a way to send a request (app.request under Node, the worker in workerd).

/** A service under test. `token` is the write secret the service was given. */
export interface RouteTarget {
  fetch(path: string, init?: RequestInit): Promise<Response>
  token: string
}

/** JSON of a response, with its status, for compact assertions. */
// biome-ignore lint/suspicious/noExplicitAny: answers of many shapes, read field by field in assertions
export async function json(res: Response): Promise<{ status: number; body: any }> {
  return { status: res.status, body: await res.json() }
}

/** A model name no other test uses (the suites share one store per run). */
export function freshName(prefix: string): string {
  return `${prefix}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`
}

/** A JSON POST. */
export function postJson(body: unknown, headers: Record<string, string> = {}): RequestInit {
  return {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...headers },
    body: JSON.stringify(body),
  }
}
