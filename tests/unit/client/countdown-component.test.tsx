// @vitest-environment jsdom
import { act, cleanup, render, renderHook, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { Countdown, useNow } from '@/components/install/countdown';
import { recordServerDate, resetServerClock } from '@/lib/client/server-time';
import { IntlWrapper } from '../i18n/intl';

const START = new Date(Date.UTC(2026, 4, 4, 8, 0, 0));
const at = (minutes: number) => new Date(START.getTime() + minutes * 60_000);

// Vitest runs without globals, so Testing Library cannot unmount by itself between tests.
afterEach(() => {
  cleanup();
  vi.useRealTimers();
  resetServerClock();
});

describe('<Countdown>', () => {
  it('shows the time left in large tabular digits, slate/brand while on time', () => {
    render(<Countdown label="Inflate by" start={START} deadline={at(40)} now={at(9)} />, { wrapper: IntlWrapper });
    const timer = screen.getByRole('timer');
    expect(timer).toHaveTextContent('0:31:00');
    expect(timer.className).toContain('tabular-nums');
    expect(timer.className).toContain('text-5xl');
    expect(timer.className).toContain('text-brand-800');
    expect(screen.getByTestId('countdown')).toHaveAttribute('data-tone', 'neutral');
    expect(screen.getByRole('heading', { name: 'Inflate by' })).toBeInTheDocument();
  });

  it("shows the deadline's clock time in the company's zone on a 24-hour clock", () => {
    // 08:40 UTC is 02:40 in America/Denver in May (MDT, UTC−6: IANA tz database).
    render(<Countdown label="Inflate by" start={START} deadline={at(40)} now={at(9)} timeZone="America/Denver" />, {
      wrapper: IntlWrapper,
    });
    expect(screen.getByTestId('countdown').querySelector('time')).toHaveTextContent(/^02:40$/);
  });

  it('turns amber when the deadline is near', () => {
    render(<Countdown label="Inflate by" start={START} deadline={at(40)} now={at(32)} />, { wrapper: IntlWrapper });
    expect(screen.getByTestId('countdown')).toHaveAttribute('data-tone', 'near');
    expect(screen.getByTestId('countdown').className).toContain('bg-near-100');
    expect(screen.getByRole('timer')).toHaveTextContent('0:08:00');
    expect(screen.getByRole('timer').className).toContain('text-near-700');
  });

  it('turns red and counts the time over once missed, and says so politely', () => {
    render(<Countdown label="Inflate by" start={START} deadline={at(40)} now={at(42)} />, { wrapper: IntlWrapper });
    expect(screen.getByTestId('countdown')).toHaveAttribute('data-tone', 'missed');
    expect(screen.getByTestId('countdown').className).toContain('bg-missed-100');
    expect(screen.getByRole('timer')).toHaveTextContent('+0:02:00 over');
    const live = screen.getByText('Inflate by: deadline passed');
    expect(live).toHaveAttribute('aria-live', 'polite');
  });

  it("shows the deadline's clock time in the zone given", () => {
    render(<Countdown label="Deflate after" start={START} deadline={at(40)} now={at(1)} timeZone="UTC" />, {
      wrapper: IntlWrapper,
    });
    const time = screen.getByText(/08:40|8:40/);
    expect(time).toHaveAttribute('datetime', at(40).toISOString());
  });
});

describe('useNow', () => {
  it('ticks every interval by the server-corrected clock', () => {
    vi.useFakeTimers();
    vi.setSystemTime(START);
    // The server is 10 minutes ahead of this tablet.
    recordServerDate(new Date(START.getTime() + 600_000).toUTCString(), START.getTime(), START.getTime());
    const { result } = renderHook(() => useNow(1000));
    const first = result.current.getTime();
    expect(Math.abs(first - (START.getTime() + 600_000))).toBeLessThan(1000);
    act(() => {
      vi.advanceTimersByTime(3000);
    });
    expect(result.current.getTime() - first).toBeGreaterThanOrEqual(2000);
    expect(result.current.getTime() - first).toBeLessThanOrEqual(3100);
  });
});
