import { redirect } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/session';
import { homeFor } from '@/lib/auth/roles';

export const dynamic = 'force-dynamic';

/** The root sends each role to its own home. */
export default async function Page() {
  const user = await requirePageUser();
  redirect(homeFor(user.role));
}
