import type { ReactNode } from 'react';
import { IntlScope } from '@/components/shell/intl-scope';

/** The profile's failure page (error.tsx sits inside this layout) says what went wrong in the reader's language. */
export default function ProfileLayout({ children }: { children: ReactNode }) {
  return <IntlScope namespaces={[]}>{children}</IntlScope>;
}
