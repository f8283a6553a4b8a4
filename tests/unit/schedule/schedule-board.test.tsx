// @vitest-environment jsdom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ScheduleBoard } from '@/app/(desk)/schedule/schedule-board';
import type { BoardJob, ScheduleBoard as Board } from '@/lib/data/schedule';
import { weekDays } from '@/lib/schedule/week';

vi.mock('next/navigation', () => ({ useRouter: () => ({ refresh: vi.fn(), push: vi.fn() }) }));
afterEach(() => cleanup());

const job = (n: number, status: BoardJob['status'] = 'scheduled'): BoardJob => ({
  id: `00000000-0000-4000-8000-00000000000${n}`,
  number: `2026-000${n}`,
  title: null,
  status,
  crewId: 'c1',
  scheduledDate: '2026-12-02',
  customerName: `Customer ${n}`,
  siteAddress: `${n} Elm Row, Testville`,
  repairCount: n,
});

function boardWith(jobsWednesday: BoardJob[], capacity: number): Board {
  const days = weekDays('2026-11-30', 'America/Denver');
  return {
    timeZone: 'America/Denver',
    today: '2026-12-01',
    week: { start: '2026-11-30', end: '2026-12-06', previous: '2026-11-23', next: '2026-12-07', current: '2026-11-30' },
    days,
    crews: [
      {
        id: 'c1',
        name: 'East crew',
        dailyCapacity: capacity,
        archived: false,
        cells: days.map(({ date }) => {
          const jobs = date === '2026-12-02' ? jobsWednesday : [];
          return { date, jobs, count: jobs.length, overCapacity: jobs.length > capacity };
        }),
      },
    ],
    unscheduled: [],
  };
}

const wednesdayCell = () => {
  const row = screen.getByRole('row', { name: /East crew/ });
  // Cells follow the row header, Monday first: Wednesday is the third.
  return within(row).getAllByRole('cell')[2];
};

describe('ScheduleBoard', () => {
  it('heads columns with the days and rows with the crews, and marks today for assistive tech too', () => {
    render(<ScheduleBoard board={boardWith([job(1)], 4)} />);
    const headers = screen.getAllByRole('columnheader').map((th) => th.textContent);
    expect(headers[1]).toBe('Mon 30 Nov');
    expect(screen.getByRole('columnheader', { name: 'Tue 1 Dec' })).toHaveAttribute('aria-current', 'date');
    expect(screen.getByRole('columnheader', { name: 'Wed 2 Dec' })).not.toHaveAttribute('aria-current');
    expect(screen.getByRole('rowheader', { name: 'East crew' })).toBeInTheDocument();
  });

  it('lists each job with its link, customer, address, repairs and status', () => {
    render(<ScheduleBoard board={boardWith([job(2)], 4)} />);
    const cell = wednesdayCell();
    expect(within(cell).getByRole('link', { name: '2026-0002' })).toHaveAttribute(
      'href',
      '/jobs/00000000-0000-4000-8000-000000000002',
    );
    expect(cell).toHaveTextContent('Customer 2');
    expect(cell).toHaveTextContent('2 Elm Row, Testville');
    expect(cell).toHaveTextContent('2 repairs');
    expect(cell).toHaveTextContent('Scheduled');
    expect(cell).toHaveTextContent('1 of 4 jobs');
    expect(cell).not.toHaveTextContent(/over capacity/i);
  });

  it('says in words, not colour alone, when a day is over capacity', () => {
    render(<ScheduleBoard board={boardWith([job(1), job(2), job(3)], 2)} />);
    const cell = wednesdayCell();
    expect(cell).toHaveTextContent('Over capacity: 3 of 2 jobs');
    expect(cell).toHaveAttribute('data-over-capacity', 'true');
    expect(cell.className).toMatch(/bg-missed-100/);
  });

  it('offers Unassign only on jobs the schedule may still move', () => {
    render(<ScheduleBoard board={boardWith([job(1), job(2, 'closed')], 4)} />);
    const cell = wednesdayCell();
    expect(
      within(cell)
        .getAllByRole('button')
        .map((b) => b.textContent),
    ).toEqual(['Unassign 2026-0001']);
  });
});
