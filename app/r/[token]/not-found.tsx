import { RefusedLinkMessage } from '@/components/report/refused-link';

export default function NotFound() {
  return <RefusedLinkMessage />;
}
