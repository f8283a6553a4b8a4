import Link from 'next/link';
import { StatusBadge } from '@/components/ui/badge';
import type { BoardCell, BoardJob, ScheduleBoard as Board } from '@/lib/data/schedule';
import { SCHEDULABLE_STATUSES } from '@/lib/validation/schedule';
import { UnscheduleButton } from './schedule-form';
import { cn } from '@/lib/ui/cn';
import { EmptyState } from '@/components/ui/empty-state';

/** Crews down the side, the week's days across; each cell lists the crew's jobs that day and its load. */
export function ScheduleBoard({ board }: { board: Board }) {
  if (board.crews.length === 0) {
    return <EmptyState>No active crews yet. An admin adds crews under Company.</EmptyState>;
  }
  return (
    <div className="overflow-x-auto rounded-lg bg-white ring-1 ring-slate-200">
      <table className="w-full min-w-[64rem] table-fixed border-collapse text-sm">
        <caption className="sr-only">Crew schedule, week of {board.days[0].label}</caption>
        <thead>
          <tr className="border-b border-slate-200 bg-slate-50 text-left">
            <th scope="col" className="w-36 p-2 font-semibold">
              Crew
            </th>
            {board.days.map((day) => {
              const today = day.date === board.today;
              return (
                <th
                  key={day.date}
                  scope="col"
                  aria-current={today ? 'date' : undefined}
                  className={cn('p-2 font-semibold', today ? 'bg-brand-100 text-brand-900' : '')}
                >
                  {day.label}
                  {today && (
                    <span aria-hidden="true" className="ml-1 rounded bg-brand-700 px-1 text-xs font-medium text-white">
                      Today
                    </span>
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {board.crews.map((crew) => (
            <tr key={crew.id} className="border-b border-slate-100 align-top last:border-0">
              <th scope="row" className="p-2 text-left font-semibold">
                {crew.name}
                {crew.archived && <span className="block text-xs font-normal text-slate-500">(archived crew)</span>}
              </th>
              {crew.cells.map((cell) => (
                <Cell key={cell.date} cell={cell} capacity={crew.dailyCapacity} today={cell.date === board.today} />
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function Cell({ cell, capacity, today }: { cell: BoardCell; capacity: number; today: boolean }) {
  const tone = cell.overCapacity ? 'bg-missed-100 ring-2 ring-inset ring-missed-600' : today ? 'bg-brand-50' : '';
  return (
    <td className={cn('p-1.5', tone)} data-over-capacity={cell.overCapacity || undefined}>
      <ul className="space-y-1.5">
        {cell.jobs.map((job) => (
          <li key={job.id} className="rounded border border-slate-200 bg-white p-1.5">
            <JobSummary job={job} />
            {SCHEDULABLE_STATUSES.includes(job.status) && <UnscheduleButton jobId={job.id} number={job.number} />}
          </li>
        ))}
      </ul>
      {cell.count > 0 && (
        <p className={cn('mt-1 text-xs', cell.overCapacity ? 'font-semibold text-missed-700' : 'text-slate-600')}>
          {cell.overCapacity ? `Over capacity: ${cell.count} of ${capacity} jobs` : `${cell.count} of ${capacity} jobs`}
        </p>
      )}
    </td>
  );
}

function JobSummary({ job }: { job: BoardJob }) {
  return (
    <div className="space-y-0.5">
      <div className="flex flex-wrap items-center gap-1">
        <Link href={`/jobs/${job.id}`} className="font-semibold text-brand-700 hover:underline">
          {job.number}
        </Link>
        <StatusBadge status={job.status} />
      </div>
      <p className="truncate" title={job.customerName}>
        {job.customerName}
      </p>
      <p className="truncate text-xs text-slate-600" title={job.siteAddress}>
        {job.siteAddress}
      </p>
      <p className="text-xs text-slate-600">{job.repairCount === 1 ? '1 repair' : `${job.repairCount} repairs`}</p>
    </div>
  );
}

/** The jobs waiting for a crew or a day (drafts included), beside the board. */
export function UnscheduledList({ jobs }: { jobs: BoardJob[] }) {
  return (
    <aside
      aria-labelledby="unscheduled-heading"
      className="w-full shrink-0 rounded-lg bg-white p-3 ring-1 ring-slate-200 xl:w-72"
    >
      <h2 id="unscheduled-heading" className="mb-2 font-semibold">
        Unscheduled jobs ({jobs.length})
      </h2>
      {jobs.length === 0 ? (
        <p className="text-sm text-slate-600">Every open job has a crew and a day.</p>
      ) : (
        <ul className="space-y-2 text-sm">
          {jobs.map((job) => (
            <li key={job.id} className="rounded border border-slate-200 p-2">
              <JobSummary job={job} />
              {job.status !== 'draft' && !job.crewId && (
                <p className="text-xs text-slate-600">Day set ({job.scheduledDate}), no crew</p>
              )}
              {job.crewId && !job.scheduledDate && <p className="text-xs text-slate-600">Crew set, no day</p>}
            </li>
          ))}
        </ul>
      )}
    </aside>
  );
}
