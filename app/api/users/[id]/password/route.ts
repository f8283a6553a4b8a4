import { NextResponse } from 'next/server';
import { ownRowId } from '@/lib/data/access';
import { requireUser } from '@/lib/auth/session';
import { resetPassword } from '@/lib/data/users';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow } from '@/lib/server/http';
import { passwordResetSchema } from '@/lib/validation/users';

type Context = { params: Promise<{ id: string }> };

/** The admin sets a new password for the user; their existing sessions end. */
export const POST = handle(async (request: Request, { params }: Context) => {
  const user = await requireUser(ADMIN_ONLY);
  const id = await ownRowId(user, 'user', params, 'User');
  const { password } = parseOrThrow(passwordResetSchema, await bodyOf(request));
  return NextResponse.json(await resetPassword(user, id, password));
});
