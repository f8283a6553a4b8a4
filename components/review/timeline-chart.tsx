import { timelineGeometry, type TimelineInput, type TimelineTone } from '@/lib/review/timeline';
import { cn } from '@/lib/ui/cn';

const FILL: Record<TimelineTone, string> = {
  plan: 'fill-slate-200',
  done: 'fill-safe-600',
  near: 'fill-near-500',
  missed: 'fill-missed-600',
};
const STROKE: Record<TimelineTone, string> = {
  plan: 'stroke-slate-500',
  done: 'stroke-safe-700',
  near: 'stroke-near-700',
  missed: 'stroke-missed-700',
};

/**
 * Plan against reality as hand-written SVG (the geometry is lib/review/timeline.ts, shared with the
 * repair report): light bars are what the resin allowed, solid bars what the crew did, amber and red
 * where reality came close to or missed the plan. A list under it says the same in words.
 */
export function TimelineChart({ input, timeZone }: { input: TimelineInput; timeZone: string }) {
  const g = timelineGeometry(input);
  if (!g) return <p className="text-sm text-slate-500">No clock to draw: the resin was not mixed on this install.</p>;
  const clock = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hour12: false });
  const time = (at: Date) => clock.format(at);
  return (
    <figure data-testid="timeline-chart" className="space-y-2">
      <svg
        viewBox={`0 0 ${g.width} ${g.height}`}
        className="h-auto w-full max-w-3xl"
        role="img"
        aria-labelledby="timeline-title"
      >
        <title id="timeline-title">Install timeline: plan against what was recorded</title>
        {g.ticks.map((tick) => (
          <g key={tick.at.getTime()}>
            <line x1={tick.x} x2={tick.x} y1={0} y2={g.axisY} className="stroke-slate-200" strokeWidth={1} />
            <text x={tick.x} y={g.axisY + 16} textAnchor="middle" className="fill-slate-600 text-[11px]">
              {time(tick.at)}
            </text>
          </g>
        ))}
        <line x1={g.plotLeft} x2={g.plotRight} y1={g.axisY} y2={g.axisY} className="stroke-slate-400" strokeWidth={1} />
        {g.lanes.map((lane) => {
          const inner = lane.height * 0.44;
          const innerY = lane.y + (lane.height - inner) / 2;
          return (
            <g key={lane.key} data-lane={lane.key}>
              <text
                x={g.plotLeft - 8}
                y={lane.y + lane.height / 2 + 4}
                textAnchor="end"
                className="fill-slate-800 text-[12px] font-medium"
              >
                {lane.label}
              </text>
              <rect
                x={lane.plan.x}
                y={lane.y}
                width={lane.plan.width}
                height={lane.height}
                rx={3}
                className={FILL.plan}
              >
                <title>{`${lane.plan.label}: ${time(lane.plan.from)}–${time(lane.plan.to)}`}</title>
              </rect>
              {lane.actual && (
                <rect
                  x={lane.actual.x}
                  y={innerY}
                  width={lane.actual.width}
                  height={inner}
                  rx={2}
                  className={FILL[lane.actual.tone]}
                  data-tone={lane.actual.tone}
                >
                  <title>{`${lane.actual.label}: ${time(lane.actual.from)}–${time(lane.actual.to)}`}</title>
                </rect>
              )}
              {lane.miss && (
                <rect
                  x={lane.miss.x}
                  y={lane.y}
                  width={Math.max(lane.miss.width, 2)}
                  height={lane.height}
                  rx={2}
                  className={cn(FILL[lane.miss.tone], 'opacity-40')}
                  data-tone={lane.miss.tone}
                >
                  <title>{lane.miss.label}</title>
                </rect>
              )}
              {lane.mark && (
                <line
                  x1={lane.mark.x}
                  x2={lane.mark.x}
                  y1={lane.y - 3}
                  y2={lane.y + lane.height + 3}
                  className={STROKE[lane.mark.tone]}
                  strokeWidth={2.5}
                >
                  <title>{`${lane.mark.label} ${time(lane.mark.at)}`}</title>
                </line>
              )}
            </g>
          );
        })}
      </svg>
      <figcaption>
        <ul className="grid gap-1 text-sm md:grid-cols-3">
          {g.lanes.map((lane) => (
            <li key={lane.key}>
              <span className="font-medium">{lane.label}:</span> plan {time(lane.plan.from)}–{time(lane.plan.to)}
              {lane.actual && (
                <>
                  ; actual {time(lane.actual.from)}–{time(lane.actual.to)}
                </>
              )}
              {lane.miss && (
                <span
                  className={
                    lane.miss.tone === 'missed' ? 'font-semibold text-missed-700' : 'font-semibold text-near-700'
                  }
                >
                  {' '}
                  · {lane.miss.label}
                </span>
              )}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
