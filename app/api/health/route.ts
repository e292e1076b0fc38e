import { NextResponse } from 'next/server';
import { checkHealth } from '@/lib/health';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export async function GET(): Promise<Response> {
  const report = await checkHealth();
  return NextResponse.json(report, { status: report.database.ok ? 200 : 503, headers: { 'cache-control': 'no-store' } });
}
