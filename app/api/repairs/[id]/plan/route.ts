import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getRepairPlan } from '@/lib/data/repairs';
import { handle, idOf, parseOrThrow, searchParamsOf } from '@/lib/server/http';
import { repairPlanQuerySchema } from '@/lib/validation/repairs';

type Context = { params: Promise<{ id: string }> };

/**
 * The planning panel's figures (SI): `?groundwaterHeadMm=&thicknessMm=&ovalityPct=&patchLengthMm=&longTermModulusMpa=`;
 * what is left out comes from the repair's saved plan or the defaults.
 */
export const GET = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser();
  const id = await idOf(params, 'Repair');
  const query = parseOrThrow(repairPlanQuerySchema, searchParamsOf(request));
  return NextResponse.json(await getRepairPlan(user, id, query));
});
