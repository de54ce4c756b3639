// Benchmark: GET /api/v1/editions/current with a 5,000-value edition, over real HTTP.
// Usage: BASE_URL=http://127.0.0.1:3000 DATABASE_URL=mysql://… tsx perf/editions.bench.ts
// Creates a throwaway site with an edition in force, measures the 200 path and the 304 path, prints
// the gzipped payload size and the ratio of each figure to its target, then removes the site.
// Server time (what the targets are about) is read from the served build's own clock when `npm run
// perf` preloads perf/server-clock.mjs into it (RUNGBOOK_SERVER_CLOCK names its file); the round trip
// the client sees (time to last byte on loopback, an upper bound) is printed beside it, and is the
// figure compared with the target when no server clock is available.
import { existsSync, readFileSync, statSync } from 'node:fs';
import http from 'node:http';
import { performance } from 'node:perf_hooks';
import { v7 } from 'uuid';
import { STARTER_EDITION_VALUES } from '../db/seed/starter-edition';
import { closeDb, makeSite, query } from '../tests/support/db';
import { Client } from '../tests/support/http';

const BASE_URL = process.env.BASE_URL ?? process.env.PUBLIC_URL ?? 'http://127.0.0.1:3000';
if (!process.env.DATABASE_URL) throw new Error('set DATABASE_URL (and BASE_URL) to the running app and its database');
const VALUES = 5000;
const RUNS_200 = Number(process.env.BENCH_RUNS ?? 200);
const RUNS_304 = Number(process.env.BENCH_RUNS_304 ?? 500);
const TARGET_200_P95_MS = 50;
const TARGET_304_P95_MS = 5;

/** 5,000 values with the starter edition's properties, numbers and citations (so the payload is realistic); species beyond the starter set are synthetic. */
function syntheticValues() {
  const out: { species: string; phase: string; charge: number; property: string; value: string; uncertainty: string | null; unit: string; coordination: number | null; structure: string | null; scale: string | null; source: string; fromMemory: boolean; note: string | null }[] = [];
  for (let copy = 0; out.length < VALUES; copy++) {
    for (const v of STARTER_EDITION_VALUES) {
      if (out.length >= VALUES) break;
      out.push({
        species: copy === 0 ? v.species : `C${copy}H${2 * copy + 2}·${v.species}`,
        phase: v.phase,
        charge: v.charge,
        property: v.property,
        value: v.value,
        uncertainty: v.uncertainty,
        unit: v.unit,
        coordination: v.coordination ?? null,
        structure: v.structure ?? null,
        scale: v.scale ?? null,
        source: v.source,
        fromMemory: v.fromMemory,
        note: v.note ?? null,
      });
    }
  }
  return out;
}

async function seedEdition(siteId: string, authorId: string, approverId: string) {
  const editionId = v7();
  const values = syntheticValues();
  await query(
    `INSERT INTO editions (id, site_id, number, state, change_summary, author_user_id, approver_user_id, created_at, updated_at, in_force_at, value_count, in_force_slot)
     VALUES (?, ?, 1, 'in_force', 'benchmark edition (synthetic species)', ?, ?, UTC_TIMESTAMP(3), UTC_TIMESTAMP(3), UTC_TIMESTAMP(3), ?, 1)`,
    [editionId, siteId, authorId, approverId, values.length],
  );
  const species = new Map<string, string>();
  for (const v of values) species.set(`${v.species}|${v.phase}|${v.charge}`, '');
  const keys = [...species.keys()];
  for (let i = 0; i < keys.length; i += 500) {
    const part = keys.slice(i, i + 500);
    await query(
      `INSERT INTO ref_species (id, formula, phase, charge, created_at) VALUES ${part.map(() => '(?, ?, ?, ?, UTC_TIMESTAMP(3))').join(',')} ON DUPLICATE KEY UPDATE formula = formula`,
      part.flatMap((k) => {
        const [f, p, c] = k.split('|');
        return [v7(), f, p, Number(c)];
      }),
    );
  }
  const rows = await query<{ id: string; formula: string; phase: string; charge: number }>('SELECT id, formula, phase, charge FROM ref_species');
  for (const r of rows) if (species.has(`${r.formula}|${r.phase}|${r.charge}`)) species.set(`${r.formula}|${r.phase}|${r.charge}`, r.id);
  for (let i = 0; i < values.length; i += 500) {
    const part = values.slice(i, i + 500);
    await query(
      `INSERT INTO edition_values (id, edition_id, species_id, property, coordination, value_key, value, uncertainty, unit, structure, scale, source, from_memory, note) VALUES ${part.map(() => '(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)').join(',')}`,
      part.flatMap((v) => [
        v7(), editionId, species.get(`${v.species}|${v.phase}|${v.charge}`), v.property, v.coordination,
        `${v.species}|${v.phase}|${v.property}|${v.coordination ?? ''}`, v.value, v.uncertainty, v.unit, v.structure, v.scale, v.source, v.fromMemory, v.note,
      ]),
    );
  }
  return editionId;
}

function get(path: string, headers: Record<string, string>): Promise<{ status: number; bytes: number; ms: number; etag: string | undefined; handlerMs: number }> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const req = http.get(new URL(path, BASE_URL), { headers, agent: keepAlive }, (res) => {
      let bytes = 0;
      res.on('data', (c: Buffer) => (bytes += c.length));
      const timing = /edition;dur=([\d.]+)/.exec(String(res.headers['server-timing'] ?? ''));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, bytes, ms: performance.now() - t0, etag: res.headers.etag, handlerMs: timing ? Number(timing[1]) : NaN }));
      res.on('error', reject);
    });
    req.on('error', reject);
  });
}
const keepAlive = new http.Agent({ keepAlive: true, maxSockets: 1 });

/** The served build's own request clock (perf/server-clock.mjs), if this run has one. */
const CLOCK = process.env.RUNGBOOK_SERVER_CLOCK;
const settle = () => new Promise((r) => setTimeout(r, 700)); // the clock writes its lines at least every 250 ms
async function clockMark(): Promise<number> {
  if (!CLOCK) return 0;
  await settle();
  return existsSync(CLOCK) ? statSync(CLOCK).size : 0;
}
async function serverTimes(since: number, path: string, status: number): Promise<number[]> {
  if (!CLOCK) return [];
  await settle();
  if (!existsSync(CLOCK)) return [];
  return readFileSync(CLOCK).subarray(since).toString('utf8').split('\n')
    .map((line) => line.split('\t'))
    .filter((f) => f.length === 4 && f[1] === path && Number(f[2]) === status)
    .map((f) => Number(f[3]));
}

function pct(list: number[], p: number) {
  const s = [...list].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)]!;
}

const site = await makeSite('bench-editions');
try {
  await seedEdition(site.siteId, site.users.technician.id, site.users.supervisor.id);
  const client = new Client(BASE_URL);
  const error = await client.signIn(site.users.technician.email, site.password);
  if (error) throw new Error(`sign-in failed: ${error}`);
  const cookie = (await client.raw('/api/v1/me')).ok ? cookieOf(client) : '';
  const base = { cookie, 'accept-encoding': 'gzip' };

  const cold = await get('/api/v1/editions/current', base);
  if (cold.status !== 200) throw new Error(`GET /api/v1/editions/current answered ${cold.status}`);
  const etag = cold.etag!;
  for (let i = 0; i < 10; i++) await get('/api/v1/editions/current', base);
  const t200: number[] = [];
  const h200: number[] = [];
  let gz = 0;
  const mark200 = await clockMark();
  for (let i = 0; i < RUNS_200; i++) {
    const r = await get('/api/v1/editions/current', base);
    if (r.status !== 200) throw new Error(`expected 200, got ${r.status}`);
    t200.push(r.ms);
    h200.push(r.handlerMs);
    gz = r.bytes;
  }
  const s200 = await serverTimes(mark200, '/api/v1/editions/current', 200);
  const raw = await get('/api/v1/editions/current', { cookie });
  const t304: number[] = [];
  const mark304 = await clockMark();
  const h304: number[] = [];
  for (let i = 0; i < RUNS_304; i++) {
    const r = await get('/api/v1/editions/current', { ...base, 'if-none-match': etag });
    if (r.status !== 304) throw new Error(`expected 304, got ${r.status}`);
    t304.push(r.ms);
    h304.push(r.handlerMs);
  }
  const s304 = await serverTimes(mark304, '/api/v1/editions/current', 304);
  // The floor under any signed-in request: GET /api/v1/me does the same session check and one read.
  const tMe: number[] = [];
  const markMe = await clockMark();
  for (let i = 0; i < RUNS_304; i++) tMe.push((await get('/api/v1/me', { cookie })).ms);
  const sMe = await serverTimes(markMe, '/api/v1/me', 200);
  const f = (n: number) => n.toFixed(2);
  const haveClock = s200.length === RUNS_200 && s304.length === RUNS_304;
  const line = (label: string, server: number[], trip: number[], target: number) => {
    const judged = haveClock ? server : trip;
    const p95 = pct(judged, 95);
    const verdict = `target p95 ≤ ${target} ms (${haveClock ? 'server time' : 'round trip: no server clock in this run'}), ratio ${(p95 / target).toFixed(2)} — ${p95 <= target ? 'met' : 'MISSED'}`;
    console.log(`  ${label}`);
    if (haveClock) console.log(`    server time:  p50 ${f(pct(server, 50))} ms, p95 ${f(pct(server, 95))} ms, p99 ${f(pct(server, 99))} ms, max ${f(Math.max(...server))} ms`);
    console.log(`    round trip:   p50 ${f(pct(trip, 50))} ms, p95 ${f(pct(trip, 95))} ms, p99 ${f(pct(trip, 99))} ms, max ${f(Math.max(...trip))} ms`);
    console.log(`    ${verdict}`);
  };
  console.log(`GET /api/v1/editions/current — ${VALUES} values, ${BASE_URL}`);
  console.log(`  first request (cold body): ${f(cold.ms)} ms`);
  line(`200 path, ${RUNS_200} runs:`, s200, t200, TARGET_200_P95_MS);
  line(`304 path, ${RUNS_304} runs:`, s304, t304, TARGET_304_P95_MS);
  console.log(`  for scale, GET /api/v1/me (session check + one read): ${sMe.length ? `server p50 ${f(pct(sMe, 50))} ms, p95 ${f(pct(sMe, 95))} ms; ` : ''}round trip p50 ${f(pct(tMe, 50))} ms, p95 ${f(pct(tMe, 95))} ms`);
  console.log(`  handler's own time (Server-Timing, after the sign-in check, before compression): 200 p95 ${f(pct(h200, 95))} ms, 304 p95 ${f(pct(h304, 95))} ms`);
  console.log(`  payload: ${(gz / 1024).toFixed(1)} KiB gzipped, ${(raw.bytes / 1024).toFixed(1)} KiB uncompressed (${(raw.bytes / gz).toFixed(1)}×)`);
  console.log('  (server time: Node has parsed the request head → the last byte is handed to the socket, in the served process; round trip: request to last byte over loopback with keep-alive, client included)');
} finally {
  await cleanup(site.siteId);
  await closeDb();
  keepAlive.destroy();
}

function cookieOf(c: Client): string {
  return (c as unknown as { cookieHeader(): string }).cookieHeader();
}

async function cleanup(siteId: string) {
  await query('DELETE v FROM edition_values v JOIN editions e ON e.id = v.edition_id WHERE e.site_id = ?', [siteId]);
  await query('DELETE FROM edition_value_events WHERE site_id = ?', [siteId]);
  await query('DELETE FROM editions WHERE site_id = ?', [siteId]);
  await query("DELETE FROM ref_species WHERE formula LIKE 'C%H%·%' AND id NOT IN (SELECT species_id FROM edition_values)");
  await query('DELETE FROM audit_log WHERE site_id = ?', [siteId]);
  await query('DELETE FROM users WHERE site_id = ?', [siteId]);
  await query('DELETE FROM sites WHERE id = ?', [siteId]);
}
