/** Same-origin JSON requests from our pages, with the server's error message on failure. */
export type JsonResult<T = unknown> =
  | { ok: true; status: number; data: T }
  | { ok: false; status: number; message: string; fields?: { field: string; message: string }[] };

export async function postJson<T = unknown>(url: string, body: unknown, method = 'POST'): Promise<JsonResult<T>> {
  try {
    const res = await fetch(url, { method, headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });
    const data = await res.json().catch(() => null);
    if (res.ok) return { ok: true, status: res.status, data: data as T };
    return { ok: false, status: res.status, message: data?.error?.message ?? `The server answered ${res.status}.`, fields: data?.error?.fields };
  } catch {
    return { ok: false, status: 0, message: 'No connection to the server. Check the network and try again.' };
  }
}

/** GET JSON; a failure throws an Error carrying the server's message (for TanStack Query). */
export async function getJson<T>(url: string): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { headers: { accept: 'application/json' }, cache: 'no-store' });
  } catch {
    throw new Error('No connection to the server. Check the network and try again.');
  }
  const data = await res.json().catch(() => null);
  if (!res.ok) throw new Error(data?.error?.message ?? `The server answered ${res.status}.`);
  return data as T;
}
