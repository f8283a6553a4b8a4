import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { getRepair, removeRepair, updateRepair } from '@/lib/data/repairs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/server/http';
import { repairPatchSchema } from '@/lib/validation/repairs';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser();
  return NextResponse.json(await getRepair(user, await idOf(params, 'Repair')));
});

/** Edits the defect, saves the plan (patch length, packer, thickness, groundwater, ovality), cancels or restores. */
export const PATCH = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  const id = await ownRowId(user, 'repair', params, 'Repair');
  const patch = parseOrThrow(repairPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateRepair(user, id, patch));
});

/** Cancels the repair when an install has started on it, deletes it otherwise. */
export const DELETE = handle(async (_request: Request, { params }: Context) => {
  const user = await requireUser(DESK_ROLES);
  return NextResponse.json(await removeRepair(user, await idOf(params, 'Repair')));
});
