import { label } from '@/lib/domain/vocabulary';

type Tone = 'neutral' | 'brand' | 'near' | 'missed' | 'safe';

const TONES: Record<Tone, string> = {
  neutral: 'bg-slate-100 text-slate-700 ring-slate-300',
  brand: 'bg-brand-50 text-brand-800 ring-brand-100',
  near: 'bg-near-100 text-near-700 ring-near-500/40',
  missed: 'bg-missed-100 text-missed-700 ring-missed-600/30',
  safe: 'bg-safe-100 text-safe-700 ring-safe-600/30',
};

export function Badge({ tone = 'neutral', children }: { tone?: Tone; children: React.ReactNode }) {
  return <span className={`inline-flex items-center rounded px-2 py-0.5 text-xs font-medium ring-1 ring-inset ${TONES[tone]}`}>{children}</span>;
}

const STATUS_TONES: Record<string, Tone> = {
  draft: 'neutral', scheduled: 'brand', in_progress: 'near', awaiting_review: 'near', sent_back: 'missed',
  approved: 'safe', reported: 'safe', closed: 'neutral', cancelled: 'neutral',
  issued: 'brand', paid: 'safe', void: 'neutral',
};

export function StatusBadge({ status }: { status: string }) {
  return <Badge tone={STATUS_TONES[status] ?? 'neutral'}>{label(status)}</Badge>;
}
