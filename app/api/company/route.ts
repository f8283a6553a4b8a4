import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getCompany, updateCompany } from '@/lib/data/company';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow } from '@/lib/server/http';
import { companyPatchSchema } from '@/lib/validation/company';

/** The caller's company settings; every signed-in user of the company may read them. */
export const GET = handle(async () => {
  const user = await requireUser();
  return NextResponse.json(await getCompany(user));
});

export const PATCH = handle(async (request: Request) => {
  const user = await requireUser(ADMIN_ONLY);
  const patch = parseOrThrow(companyPatchSchema, await bodyOf(request));
  return NextResponse.json(await updateCompany(user, patch));
});
