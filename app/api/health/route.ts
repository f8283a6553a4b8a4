import { NextResponse } from 'next/server';
import { sequelize } from '@/lib/db';

export const dynamic = 'force-dynamic';

/** Liveness for scripts and monitors: no session needed, reveals nothing but up/down. */
export async function GET() {
  try {
    await sequelize.query('SELECT 1');
    return NextResponse.json({ ok: true, db: true });
  } catch {
    return NextResponse.json({ ok: false, db: false }, { status: 503 });
  }
}
