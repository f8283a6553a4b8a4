import { formatInZone } from '@/lib/time/dates';
import { timelineLayout, type TimelineBand, type TimelineMark } from '@/lib/report/timeline';

const BAND_CLASSES: Record<string, string> = {
  window: 'fill-near-500/60',
  held: 'fill-brand-700/60',
  cure: 'fill-safe-600/50',
};

/** The install timeline of the repair report as inline SVG (same geometry as the PDF's). */
export function TimelineSvg({
  marks,
  bands,
  timeZone,
}: {
  marks: TimelineMark[];
  bands: TimelineBand[];
  timeZone: string;
}) {
  const g = timelineLayout(marks, bands, { width: 720, charWidth: 5.4, rowHeight: 14, bandHeight: 12 });
  if (g.marks.length === 0) return null;
  const height = g.height + 6;
  const summary = marks.map((m) => `${m.label} ${formatInZone(m.at, timeZone, 'HH:mm')}`).join(', ');
  return (
    <svg viewBox={`0 0 ${g.width} ${height}`} className="w-full" role="img" aria-label={`Install timeline: ${summary}`}>
      <line x1={g.left} y1={g.axisY} x2={g.right} y2={g.axisY} className="stroke-slate-400" />
      {g.ticks.map((tick) => (
        <g key={tick.x}>
          <line x1={tick.x} y1={g.axisY} x2={tick.x} y2={g.axisY + 4} className="stroke-slate-400" />
          <text x={tick.x} y={g.axisY + 13} textAnchor="middle" className="fill-slate-500 text-[9px]">
            {formatInZone(tick.at, timeZone, 'HH:mm')}
          </text>
        </g>
      ))}
      {g.marks.map((mark) => (
        <g key={mark.id}>
          <line x1={mark.x} y1={mark.labelY + 3} x2={mark.x} y2={g.axisY} className="stroke-brand-700" />
          <text x={mark.x} y={mark.labelY} textAnchor="middle" className="fill-slate-900 text-[10px]">
            {mark.label}
          </text>
        </g>
      ))}
      {g.bands.map((band) => (
        <g key={band.id}>
          <rect
            x={band.x}
            y={band.y}
            width={band.width}
            height={band.height}
            className={BAND_CLASSES[band.id] ?? 'fill-slate-400'}
          />
          <text x={band.x + 3} y={band.y + band.height - 3} className="fill-slate-900 text-[9px]">
            {band.label}
          </text>
        </g>
      ))}
    </svg>
  );
}
