import type { Metadata, Viewport } from 'next';
import { connection } from 'next/server';
import { getLocale, getTranslations } from 'next-intl/server';
import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/inter/700.css';
import './globals.css';
import { ErrorWordsProvider } from '@/components/shell/error-words';
import { OfflineProvider } from '@/components/shell/offline-provider';
import { siteConfig } from '@/config/site';

export const metadata: Metadata = {
  title: { default: siteConfig.name, template: `%s · ${siteConfig.name}` },
  description: siteConfig.description,
  applicationName: siteConfig.name,
};

export const viewport: Viewport = { themeColor: siteConfig.themeColor, width: 'device-width', initialScale: 1 };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request: its scripts carry that request's CSP nonce (proxy.ts), which a
  // page prerendered at build time could not.
  await connection();
  const [locale, t] = await Promise.all([getLocale(), getTranslations('common.error')]);
  return (
    <html lang={locale}>
      <body className="min-h-screen font-sans">
        <ErrorWordsProvider words={{ title: t('title'), body: t('body'), retry: t('retry') }}>
          <OfflineProvider>{children}</OfflineProvider>
        </ErrorWordsProvider>
      </body>
    </html>
  );
}
