import type { Metadata } from 'next';
import { headers } from 'next/headers';
import { getTranslations } from 'next-intl/server';
import { FieldHeading } from '@/components/field/field-heading';
import { IntlScope } from '@/components/shell/intl-scope';
import { localeFromAcceptLanguage } from '@/i18n/locales';
import { requirePageUser } from '@/lib/auth/session';
import { getProfile } from '@/lib/data/profile';
import { ProfileForm } from './profile-form';

export const dynamic = 'force-dynamic';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('profile'))('metaTitle') };
}

/** Every signed-in user's own settings: for now, the language of the screens. */
export default async function Page() {
  const user = await requirePageUser();
  const [profile, t, tc] = await Promise.all([getProfile(user), getTranslations('profile'), getTranslations('common')]);
  const browser = localeFromAcceptLanguage((await headers()).get('accept-language'));
  return (
    <main className="mx-auto max-w-xl space-y-4 p-6">
      <FieldHeading back={{ href: '/', label: `← ${tc('back')}` }} title={t('title')} className="space-y-4" />
      <p className="text-slate-700">{t('intro', { name: profile.name, email: profile.email })}</p>
      <IntlScope namespaces={['profile']}>
        <ProfileForm locale={profile.locale} browserLocale={browser} />
      </IntlScope>
    </main>
  );
}
