// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { SyncStatus } from '@/app/(field)/installs/[id]/sync-status';
import type { OutboxEntry } from '@/lib/client/outbox';
import { IntlWrapper } from '../i18n/intl';

afterEach(cleanup);

let seq = 0;
const entry = (over: Partial<OutboxEntry>): OutboxEntry => ({
  clientEventId: `id-${(seq += 1)}`,
  installId: 'i',
  type: 'resin_mixed',
  deviceTime: '2026-12-02T10:00:00Z',
  payload: {},
  seq,
  status: 'pending',
  attempts: 0,
  ...over,
});

describe('<SyncStatus> notices', () => {
  it('says whose taps wait for a sign-in, per user', () => {
    const ana = { userId: 'u-ana', userName: 'Ana Ruiz' };
    render(
      <SyncStatus
        queued={[]}
        waiting={[entry(ana), entry(ana), entry({ userId: 'u-bo', userName: 'Bo Lind' })]}
        rejected={[]}
      />,
      { wrapper: IntlWrapper },
    );
    expect(screen.getByTestId('sync-status')).toHaveTextContent('All taps synced');
    expect(screen.getAllByTestId('outbox-waiting').map((p) => p.textContent)).toEqual([
      '2 taps waiting for Ana Ruiz to sign in',
      '1 tap waiting for Bo Lind to sign in',
    ]);
  });

  it('lists parked taps as needing attention, with the server’s reason', () => {
    render(
      <SyncStatus
        queued={[entry({})]}
        rejected={[
          entry({
            type: 'bladder_inflated',
            status: 'rejected',
            lastError: 'This install is closed (approved): nothing more can be recorded on it.',
          }),
        ]}
      />,
      { wrapper: IntlWrapper },
    );
    expect(screen.getByTestId('sync-status')).toHaveTextContent('1 tap saved on this tablet');
    expect(screen.getByRole('region', { name: 'Needs attention' })).toBeInTheDocument();
    expect(screen.getByTestId('outbox-parked-entry')).toHaveTextContent(
      'bladder inflated: This install is closed (approved): nothing more can be recorded on it.',
    );
    expect(screen.queryByTestId('outbox-waiting')).toBeNull();
  });
});
