'use client';

import { SectionErrorView } from '@/components/shell/error-view';

export default function Error({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <SectionErrorView reset={reset} />;
}
