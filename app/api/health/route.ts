import { NextResponse } from 'next/server';
import { databaseUp } from '@/lib/data/health';

export const dynamic = 'force-dynamic';

/** Liveness for scripts and monitors: no session needed, reveals nothing but up/down. */
export async function GET() {
  const db = await databaseUp();
  return NextResponse.json({ ok: db, db }, { status: db ? 200 : 503 });
}
