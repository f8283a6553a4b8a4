import type { Metadata } from 'next';
import { Suspense } from 'react';
import { Logo } from '@/components/shell/logo';
import { siteConfig } from '@/config/site';
import { SignInForm } from './sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default function Page() {
  return (
    <main className="flex min-h-screen items-center justify-center bg-slate-900 p-4">
      <div className="w-full max-w-md rounded-xl bg-white p-8 shadow-xl">
        <div className="mb-6 flex items-center gap-3 text-brand-700">
          <Logo className="h-10 w-10" />
          <div>
            <h1 className="text-2xl font-bold text-slate-900">{siteConfig.name}</h1>
            <p className="text-sm text-slate-600">Sign in to your company&apos;s jobs</p>
          </div>
        </div>
        <Suspense>
          <SignInForm />
        </Suspense>
      </div>
    </main>
  );
}
