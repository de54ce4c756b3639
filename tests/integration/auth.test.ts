import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, DEMO, signedIn, waitForMail } from '../support/http';
import { closeDb, makeSite, query } from '../support/db';

let site: Awaited<ReturnType<typeof makeSite>>;
beforeAll(async () => {
  site = await makeSite('auth');
});
afterAll(closeDb);

describe('signing in', () => {
  it.each([
    ['technician', DEMO.technician],
    ['supervisor', DEMO.supervisor],
    ['admin', DEMO.admin],
  ])('a %s signs in with e-mail and password and the session carries role and site', async (role, email) => {
    const c = await signedIn(email);
    const me = await c.get<{ role: string; siteId: string; email: string }>('/api/v1/me');
    expect(me.status).toBe(200);
    expect(me.body.role).toBe(role);
    expect(me.body.email).toBe(email);
    const [row] = await query<{ site_id: string }>('SELECT site_id FROM users WHERE email = ?', [email]);
    expect(me.body.siteId).toBe(row!.site_id);
  });

  it('a wrong password and an unknown e-mail get the same generic refusal', async () => {
    const wrong = await new Client().signIn(site.users.technician.email, 'not-the-password');
    const unknown = await new Client().signIn('nobody-here@example.test', 'whatever-password');
    expect(wrong).toBe('CredentialsSignin');
    expect(unknown).toBe(wrong);
  });

  it('too many attempts are refused by the rate limit, even with the right password', async () => {
    const email = site.users.supervisor2.email;
    const limit = Number(process.env.RATE_LIMIT_SIGN_IN ?? 10);
    for (let i = 0; i < limit; i++) expect(await new Client().signIn(email, `wrong-${i}`)).toBe('CredentialsSignin');
    expect(await new Client().signIn(email, site.password)).toBe('rate_limited');
    const [row] = await query<{ hits: number }>('SELECT hits FROM rate_limits WHERE bucket_key = ?', [`sign-in:email:${email}`]);
    expect(row!.hits).toBe(limit + 1);
  });

  it('signing out ends the session', async () => {
    const c = await signedIn(site.users.technician.email, site.password);
    expect((await c.get('/api/v1/me')).status).toBe(200);
    const csrf = (await (await c.raw('/api/auth/csrf')).json()) as { csrfToken: string };
    await c.raw('/api/auth/signout', { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded', origin: c.origin }, body: new URLSearchParams({ csrfToken: csrf.csrfToken, json: 'true' }) });
    expect((await c.get('/api/v1/me')).status).toBe(401);
  });
});

describe('a change to an account takes effect on the next request', () => {
  it('a deactivated user is refused at once, not when the session expires', async () => {
    const tech = await signedIn(site.users.technician.email, site.password);
    const admin = await signedIn(site.users.admin.email, site.password);
    expect((await tech.get('/api/v1/me')).status).toBe(200);
    const res = await admin.patch(`/api/v1/admin/users/${site.users.technician.id}`, { status: 'deactivated' });
    expect(res.status).toBe(200);
    const after = await tech.get<{ error: { code: string } }>('/api/v1/me');
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('unauthenticated');
    expect(await new Client().signIn(site.users.technician.email, site.password)).toBe('CredentialsSignin');
    // reactivate for the other tests; the audit log holds both changes
    expect((await admin.patch(`/api/v1/admin/users/${site.users.technician.id}`, { status: 'active' })).status).toBe(200);
    const audit = await query<{ action: string; after: string }>("SELECT action, JSON_UNQUOTE(JSON_EXTRACT(`after`, '$.status')) AS after FROM audit_log WHERE entity_id = ? ORDER BY id", [site.users.technician.id]);
    expect(audit.map((a) => a.after)).toEqual(['deactivated', 'active']);
  });

  it('a changed role applies to the next request', async () => {
    const sup = await signedIn(site.users.supervisor.email, site.password);
    const admin = await signedIn(site.users.admin.email, site.password);
    expect((await admin.patch(`/api/v1/admin/users/${site.users.supervisor.id}`, { role: 'technician' })).status).toBe(200);
    expect((await sup.get('/api/v1/me')).status).toBe(401); // signed out everywhere by the change
    const again = await signedIn(site.users.supervisor.email, site.password);
    expect((await again.get<{ role: string }>('/api/v1/me')).body.role).toBe('technician');
    expect((await admin.patch(`/api/v1/admin/users/${site.users.supervisor.id}`, { role: 'supervisor' })).status).toBe(200);
  });
});

describe('permissions', () => {
  it('pages send a visitor without a session to sign-in, and a technician away from admin', async () => {
    const anon = await new Client().raw('/admin');
    expect(anon.status).toBe(307);
    expect(anon.headers.get('location')).toContain('/sign-in?next=%2Fadmin');
    const tech = await signedIn(DEMO.technician);
    const res = await tech.raw('/admin');
    expect(res.status).toBe(307);
    expect(res.headers.get('location')).toContain('/forbidden');
    const admin = await signedIn(DEMO.admin);
    expect((await admin.raw('/admin')).status).toBe(200);
  });

  it('route handlers answer 401 and 403 as JSON', async () => {
    const anon = await new Client().get<{ error: { code: string } }>('/api/v1/admin/users');
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('unauthenticated');
    const tech = await signedIn(DEMO.technician);
    const res = await tech.get<{ error: { code: string; message: string } }>('/api/v1/admin/users');
    expect(res.status).toBe(403);
    expect(res.body.error.message).toContain('site.manage');
  });

  it('an admin sees only the users of their own site and cannot touch another site', async () => {
    const admin = await signedIn(site.users.admin.email, site.password);
    const list = await admin.get<{ users: { email: string }[] }>('/api/v1/admin/users');
    expect(list.body.users.map((u) => u.email).sort()).toEqual(Object.values(site.users).map((u) => u.email).sort());
    const [demoTech] = await query<{ id: string }>('SELECT id FROM users WHERE email = ?', [DEMO.technician]);
    const res = await admin.patch(`/api/v1/admin/users/${demoTech!.id}`, { status: 'deactivated' });
    expect(res.status).toBe(404);
    const [still] = await query<{ status: string }>('SELECT status FROM users WHERE id = ?', [demoTech!.id]);
    expect(still!.status).toBe('active');
  });
});

describe('bad requests to route handlers get a 4xx JSON error, never a 500', () => {
  it('a cross-origin POST is refused and changes nothing', async () => {
    const admin = await signedIn(site.users.admin.email, site.password);
    const res = await admin.request<{ error: { code: string } }>('POST', '/api/v1/admin/tokens', { name: 'from elsewhere', role: 'technician' }, { origin: 'https://evil.example' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_origin');
    const rows = await query('SELECT id FROM api_tokens WHERE name = ?', ['from elsewhere']);
    expect(rows).toHaveLength(0);
  });

  it('the wrong content type, malformed JSON and invalid fields', async () => {
    const admin = await signedIn(site.users.admin.email, site.password);
    const wrongType = await admin.request<{ error: { code: string } }>('POST', '/api/v1/admin/tokens', 'name=x', { 'content-type': 'application/x-www-form-urlencoded' });
    expect(wrongType.status).toBe(415);
    const malformed = await admin.request<{ error: { code: string } }>('POST', '/api/v1/admin/tokens', '{"name": ');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe('malformed_json');
    const invalid = await admin.post<{ error: { code: string; fields: { field: string }[] } }>('/api/v1/admin/users', { email: 'not-an-email', displayName: 'x', role: 'chemist' });
    expect(invalid.status).toBe(422);
    expect(invalid.body.error.fields.map((f) => f.field).sort()).toEqual(['displayName', 'email', 'role']);
  });
});

describe('API tokens', () => {
  it('a token works until it is revoked, and is stored only as a hash', async () => {
    const admin = await signedIn(site.users.admin.email, site.password);
    const created = await admin.post<{ secret: string; token: { id: string; prefix: string } }>('/api/v1/admin/tokens', { name: 'plant historian', role: 'technician' });
    expect(created.status).toBe(201);
    const { secret, token } = created.body;
    const [row] = await query<{ token_hash: string }>('SELECT token_hash FROM api_tokens WHERE id = ?', [token.id]);
    expect(row!.token_hash).not.toContain(secret.slice(4));
    expect(row!.token_hash).toMatch(/^[0-9a-f]{64}$/);

    const bearer = new Client();
    const me = await bearer.get<{ kind: string; siteId: string }>('/api/v1/me', { authorization: `Bearer ${secret}` });
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ kind: 'token', siteId: site.siteId });
    // a token never reaches admin endpoints, whatever its role
    expect((await bearer.get('/api/v1/admin/users', { authorization: `Bearer ${secret}` })).status).toBe(403);

    expect((await admin.delete(`/api/v1/admin/tokens/${token.id}`)).status).toBe(200);
    const after = await bearer.get<{ error: { code: string } }>('/api/v1/me', { authorization: `Bearer ${secret}` });
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('token_revoked');
    const unknown = await bearer.get('/api/v1/me', { authorization: 'Bearer rbt_made-up' });
    expect(unknown.status).toBe(401);
  });
});

describe('invitations and one-time links', () => {
  it('an invited user sets a password through the e-mailed link, which then cannot be reused', async () => {
    const admin = await signedIn(site.users.admin.email, site.password);
    const email = `new.tech.${Date.now()}@example.test`;
    const since = Date.now() - 1000;
    const res = await admin.post('/api/v1/admin/users', { email, displayName: 'QC lab night technician', role: 'technician' });
    expect(res.status).toBe(201);
    const mail = await waitForMail(email, 'invited', since);
    const token = /token=([\w-]+)/.exec(mail.text)?.[1];
    expect(token).toBeTruthy();
    const anon = new Client();
    const accepted = await anon.post('/api/v1/auth/invitation', { token, password: 'a-fine-long-password', confirm: 'a-fine-long-password' });
    expect(accepted.status).toBe(200);
    const reused = await anon.post<{ error: { message: string } }>('/api/v1/auth/invitation', { token, password: 'another-long-password', confirm: 'another-long-password' });
    expect(reused.status).toBe(410);
    expect(reused.body.error.message).toMatch(/already been used/);
    expect(await new Client().signIn(email, 'a-fine-long-password')).toBeNull();
  });

  it('an expired sign-in link is refused with a clear message', async () => {
    const since = Date.now() - 1000;
    const res = await new Client().post('/api/v1/auth/sign-in-link', { email: site.users.admin.email });
    expect(res.status).toBe(200);
    const mail = await waitForMail(site.users.admin.email, 'sign-in link', since);
    const token = /token=([\w-]+)/.exec(mail.text)![1]!;
    await query("UPDATE one_time_links SET expires_at = UTC_TIMESTAMP(3) - INTERVAL 1 MINUTE WHERE user_id = ? AND purpose = 'sign_in'", [site.users.admin.id]);
    const c = new Client();
    expect(await c.signIn('', '', 'link', token)).toMatch(/expired/);
    expect(c.signedIn).toBe(false);
  });

  it('an unknown address gets the same answer as a known one and no mail', async () => {
    const res = await new Client().post<{ message: string }>('/api/v1/auth/sign-in-link', { email: 'stranger@example.test' });
    expect(res.status).toBe(200);
    expect(res.body.message).toContain('If that address belongs');
  });
});

describe('health', () => {
  it('reports the database connection', async () => {
    const res = await new Client().get<{ status: string; database: { ok: boolean } }>('/api/v1/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: { ok: true } });
  });

  it('security headers are on every page', async () => {
    const res = await new Client().raw('/sign-in');
    const csp = res.headers.get('content-security-policy') ?? '';
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toContain('unsafe-eval');
    expect(res.headers.get('referrer-policy')).toBe('same-origin');
  });
});
