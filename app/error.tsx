'use client';

import { ErrorView } from '@/components/shell/error-view';
import { useErrorWords } from '@/components/shell/error-words';

export default function Error({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <ErrorView reset={reset} words={useErrorWords() ?? undefined} />;
}
