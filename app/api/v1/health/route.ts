// GET /api/v1/health – is the app up, and can it reach its database
import { sql } from 'drizzle-orm';
import { NextResponse } from 'next/server';
import { db } from '@/db/client';

export const dynamic = 'force-dynamic';

export async function GET() {
  const started = performance.now();
  try {
    await db().execute(sql`SELECT 1`);
    return NextResponse.json({ status: 'ok', database: { ok: true, ms: Math.round(performance.now() - started) } });
  } catch {
    return NextResponse.json({ status: 'degraded', database: { ok: false, message: 'The database cannot be reached.' } }, { status: 503 });
  }
}
