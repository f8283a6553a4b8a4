import type { Metadata } from 'next';
import { KeepForOffline } from '@/components/shell/keep-for-offline';
import { notFound, redirect } from 'next/navigation';
import { getTranslations } from 'next-intl/server';
import { IntlScope } from '@/components/shell/intl-scope';
import { requirePageUser } from '@/lib/auth/session';
import { getInstallView } from '@/lib/data/installs';
import { FIELD_ROLES } from '@/lib/domain/vocabulary';
import { AppError } from '@/lib/server/errors';
import { uuidSchema } from '@/lib/validation/common';
import { InstallScreen } from './install-screen';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('install'))('metaTitle') };
}

/** The message namespaces the install screen's client code reads. */
const NAMESPACES = ['install', 'labels', 'safety', 'alarms', 'sync', 'flags', 'lib', 'evidence', 'scan'];

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
  // This page may be the first one after sign-in, loaded before the service worker could keep it.
  const keep = [`/installs/${id}`, `/api/installs/${id}`];
  // Through JSON, so the client gets exactly what GET /api/installs/:id would give it.
  return (
    <IntlScope namespaces={NAMESPACES}>
      <KeepForOffline urls={keep} userId={user.id} />
      <InstallScreen
        initial={JSON.parse(JSON.stringify(view))}
        viewer={{ id: user.id, name: user.name, role: user.role }}
      />
    </IntlScope>
  );
}
