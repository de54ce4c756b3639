// A small HTTP client for integration tests: real requests to the running production build,
// with a cookie jar per signed-in user.
export const BASE_URL = process.env.PUBLIC_URL ?? 'http://127.0.0.1:3100';
export const DEMO_PASSWORD = 'calder-reach-demo';

export interface Reply<T = unknown> {
  status: number;
  headers: Headers;
  body: T;
}

export class Client {
  private cookies = new Map<string, string>();
  constructor(readonly origin = BASE_URL) {}

  private cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  private keep(res: Response) {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const i = pair!.indexOf('=');
      const name = pair!.slice(0, i);
      const value = pair!.slice(i + 1);
      if (value === '' || /max-age=0/i.test(c)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async raw(path: string, init: RequestInit = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set('cookie', this.cookieHeader());
    const res = await fetch(new URL(path, this.origin), { ...init, headers, redirect: 'manual' });
    this.keep(res);
    return res;
  }

  async request<T = Record<string, unknown>>(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Reply<T>> {
    const init: RequestInit = { method, headers: { origin: this.origin, ...headers } };
    if (body !== undefined) {
      init.body = typeof body === 'string' ? body : JSON.stringify(body);
      (init.headers as Record<string, string>)['content-type'] ??= 'application/json';
    }
    const res = await this.raw(path, init);
    const text = await res.text();
    let parsed: unknown = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      /* not JSON: keep the text */
    }
    return { status: res.status, headers: res.headers, body: parsed as T };
  }

  get<T = Record<string, unknown>>(path: string, headers?: Record<string, string>) {
    return this.request<T>('GET', path, undefined, headers);
  }
  post<T = Record<string, unknown>>(path: string, body?: unknown, headers?: Record<string, string>) {
    return this.request<T>('POST', path, body ?? {}, headers);
  }
  patch<T = Record<string, unknown>>(path: string, body?: unknown) {
    return this.request<T>('PATCH', path, body ?? {});
  }
  delete<T = Record<string, unknown>>(path: string) {
    return this.request<T>('DELETE', path, {});
  }

  /** next-auth's credentials flow over HTTP; returns the error code, or null when signed in. */
  async signIn(email: string, password = DEMO_PASSWORD, provider: 'password' | 'link' = 'password', token?: string): Promise<string | null> {
    const csrf = await this.raw('/api/auth/csrf');
    const { csrfToken } = (await csrf.json()) as { csrfToken: string };
    const form = new URLSearchParams({ csrfToken, json: 'true', ...(provider === 'password' ? { email, password } : { token: token ?? '' }) });
    const res = await this.raw(`/api/auth/callback/${provider}`, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded', origin: this.origin },
      body: form,
    });
    const location = res.headers.get('location') ?? ((await res.json().catch(() => ({}))) as { url?: string }).url ?? '';
    const error = new URL(location, this.origin).searchParams.get('error');
    return error ?? (this.signedIn ? null : 'no_session');
  }

  get signedIn() {
    return [...this.cookies.keys()].some((k) => k.endsWith('next-auth.session-token'));
  }
}

export async function signedIn(email: string, password = DEMO_PASSWORD): Promise<Client> {
  const c = new Client();
  const error = await c.signIn(email, password);
  if (error) throw new Error(`sign-in as ${email} failed: ${error}`);
  return c;
}

export const DEMO = {
  technician: 'technician@calder-reach.test',
  qcTechnician: 'qc.technician@calder-reach.test',
  supervisor: 'supervisor@calder-reach.test',
  qcSupervisor: 'qc.supervisor@calder-reach.test',
  admin: 'admin@calder-reach.test',
} as const;

/** Mail captured by the local SMTP fake, newest first. */
export async function mailTo(address: string): Promise<{ subject: string; text: string; receivedAt: string }[]> {
  const inbox = process.env.MAIL_INBOX_URL ?? 'http://127.0.0.1:2680';
  const res = await fetch(`${inbox}/messages?to=${encodeURIComponent(address)}`);
  return ((await res.json()) as { messages: { subject: string; text: string; receivedAt: string }[] }).messages;
}

export async function waitForMail(address: string, subjectPart: string, after = 0) {
  for (let i = 0; i < 50; i++) {
    const m = (await mailTo(address)).find((x) => x.subject.includes(subjectPart) && Date.parse(x.receivedAt) >= after);
    if (m) return m;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail "${subjectPart}" for ${address}`);
}
