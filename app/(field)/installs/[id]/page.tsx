import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/session';
import { getInstallView } from '@/lib/data/installs';
import { FIELD_ROLES } from '@/lib/domain/vocabulary';
import { AppError } from '@/lib/server/errors';
import { uuidSchema } from '@/lib/validation/common';
import { InstallScreen } from './install-screen';

export const metadata: Metadata = { title: 'Install' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(FIELD_ROLES);
  const { id } = await params;
  if (!uuidSchema.safeParse(id).success) notFound();
  let view;
  try {
    view = await getInstallView(user, id);
  } catch (error) {
    if (error instanceof AppError && error.status === 404) notFound();
    if (error instanceof AppError && error.status === 403) redirect('/forbidden');
    throw error;
  }
  // Through JSON, so the client gets exactly what GET /api/installs/:id would give it.
  return <InstallScreen initial={JSON.parse(JSON.stringify(view))} viewer={{ id: user.id, name: user.name, role: user.role }} />;
}
