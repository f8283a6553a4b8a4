import type { Metadata } from 'next';
import Link from 'next/link';
import { buttonVariants } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getScheduleBoard } from '@/lib/data/schedule';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { SCHEDULABLE_STATUSES, scheduleQuerySchema } from '@/lib/validation/schedule';
import { ScheduleBoard, UnscheduledList } from './schedule-board';
import { ScheduleForm } from './schedule-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Schedule' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  // A hand-edited URL with a bad week shows this week rather than failing the page.
  const parsed = scheduleQuerySchema.safeParse(await searchParams);
  const board = await getScheduleBoard(user, parsed.success ? parsed.data.week : undefined);
  const overDays = board.crews.flatMap((crew) =>
    crew.cells
      .filter((cell) => cell.overCapacity)
      .map((cell) => `${crew.name}, ${board.days.find((d) => d.date === cell.date)?.label}`),
  );
  const weekJobs = board.crews.flatMap((crew) =>
    crew.cells.flatMap((cell) => cell.jobs.map((job) => ({ ...job, crewName: crew.name }))),
  );
  const inWeek = board.today >= board.week.start && board.today <= board.week.end;

  return (
    <div className="space-y-4">
      <PageHeader
        className="items-end"
        title="Schedule"
        description={
          <>
            Week of {board.days[0].label} – {board.days[6].label} {board.week.end.slice(0, 4)} · days in{' '}
            {board.timeZone}
          </>
        }
        actions={
          <nav aria-label="Week" className="flex gap-2">
            <Link href={`/schedule?week=${board.week.previous}`} className={buttonVariants({ variant: 'secondary' })}>
              Previous week
            </Link>
            <Link
              href={`/schedule?week=${board.week.current}`}
              className={buttonVariants({ variant: 'secondary' })}
              aria-current={board.week.start === board.week.current ? 'page' : undefined}
            >
              This week
            </Link>
            <Link href={`/schedule?week=${board.week.next}`} className={buttonVariants({ variant: 'secondary' })}>
              Next week
            </Link>
          </nav>
        }
      />
      {overDays.length > 0 && (
        <p role="status" className="rounded-md bg-missed-100 p-3 text-sm font-medium text-missed-700">
          Over capacity this week: {overDays.join('; ')}. Move a job or confirm the crew can take the extra work.
        </p>
      )}
      <div className="flex flex-col gap-4 xl:flex-row xl:items-start">
        <div className="min-w-0 flex-1 space-y-4">
          <ScheduleBoard board={board} />
          <ScheduleForm
            jobs={[
              ...board.unscheduled.map((job) => ({ ...job, group: 'Waiting for a crew or a day' })),
              ...weekJobs
                .filter((job) => SCHEDULABLE_STATUSES.includes(job.status))
                .map((job) => ({ ...job, group: 'On this week’s board' })),
            ]}
            crews={board.crews
              .filter((crew) => !crew.archived)
              .map(({ id, name, dailyCapacity }) => ({ id, name, dailyCapacity }))}
            defaultDay={inWeek ? board.today : board.week.start}
          />
        </div>
        <UnscheduledList jobs={board.unscheduled} />
      </div>
    </div>
  );
}
