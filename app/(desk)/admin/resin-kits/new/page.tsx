import type { Metadata } from 'next';
import Link from 'next/link';
import { z } from 'zod';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinSystems } from '@/lib/data/resin-systems';
import { isoDateSchema } from '@/lib/validation/common';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinKitForm } from '../resin-kit-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { PageHeader } from '@/components/ui/page-header';
import { IntlScope } from '@/components/shell/intl-scope';

export const metadata: Metadata = { title: 'New resin kit' };

const scannedSchema = z.object({
  lot: z
    .string()
    .trim()
    .regex(/^[\x21-\x7e]{1,40}$/)
    .optional()
    .catch(undefined),
  expiresOn: isoDateSchema.optional().catch(undefined),
});

/** `?lot=&expiresOn=` (from a scanned label) fill the form; anything malformed is left out. */
export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const scanned = scannedSchema.parse(await searchParams);
  const [{ unitSystem }, systems] = await Promise.all([
    getCompany(user),
    listResinSystems(user, resinSystemListQuerySchema.parse({ pageSize: '100' })),
  ]);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin/resin-kits', label: 'Resin kits' }} title="New resin kit" />
      {systems.items.length === 0 ? (
        <p>
          Add a{' '}
          <Link href="/admin/resin-systems/new" className="text-brand-700 underline">
            resin system
          </Link>{' '}
          first: every kit belongs to one.
        </p>
      ) : (
        <IntlScope namespaces={['scan']}>
          <ResinKitForm unitSystem={unitSystem} systems={systems.items} scanned={scanned} />
        </IntlScope>
      )}
    </div>
  );
}
