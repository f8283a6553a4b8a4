import 'server-only';
import { getTranslations } from 'next-intl/server';
import { IntlScope } from '@/components/shell/intl-scope';
import { requirePageUser } from '@/lib/auth/session';
import { listAttachments } from '@/lib/data/attachments';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { EvidencePanel } from './evidence-panel';

/**
 * The evidence of one repair for the desk repair page: before/after images, inspection images from its
 * installs, documents. The first list is read on the server; the panel keeps it fresh and uploads.
 */
export async function RepairEvidence({ repairId }: { repairId: string }) {
  const user = await requirePageUser(DESK_ROLES);
  let initial;
  try {
    // Through JSON, as the panel would get it from GET /api/attachments.
    initial = JSON.parse(JSON.stringify(await listAttachments(user, { repairId })));
  } catch (error) {
    // Storage not reachable or not set up: the panel fetches again and shows the reason where the files would be.
    console.error('[evidence] listing failed', error);
  }
  const t = await getTranslations('evidence');
  return (
    <IntlScope namespaces={['evidence']}>
      <EvidencePanel target={{ repairId }} initial={initial} title={t('title')} defaultKind="before" />
    </IntlScope>
  );
}
