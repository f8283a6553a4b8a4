import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getProfile, updateProfile } from '@/lib/data/profile';
import { bodyOf, handle, parseOrThrow } from '@/lib/server/http';
import { profilePatchSchema } from '@/lib/validation/profile';

/** The signed-in user's own profile (any role): name, e-mail, role and language setting. */
export const GET = handle(async () => {
  const user = await requireUser();
  return NextResponse.json(await getProfile(user));
});

/** Changes the caller's own language setting (`{ locale: 'en' | 'es' | null }`; null follows the browser). */
export const PATCH = handle(async (request: Request) => {
  const user = await requireUser();
  const patch = parseOrThrow(profilePatchSchema, await bodyOf(request));
  return NextResponse.json(await updateProfile(user, patch));
});
