import { describe, expect, it } from 'vitest';
import { correctionDetails, eventDetails } from '@/lib/review/event-text';
import { localiseSentence, worstRank, worstSeverity } from '@/lib/review/flags';

const imperial = {
  unitSystem: 'imperial' as const,
  kitName: (id: string) => (id === 'k1' ? 'A-17' : undefined),
  packerName: () => '8 in packer',
};

describe('eventDetails', () => {
  it('says what each event recorded, in the company’s units', () => {
    // 20 °C = 68 °F; 14 °C = 57.2 °F; 103 kPa / 6.894757 kPa per psi = 14.94 psi (NIST SP 811 factor).
    expect(
      eventDetails(
        'conditions_recorded',
        { mixTempC: 20, pipeTempC: 14, resinKitId: 'k1', packerId: 'p1', patchLengthMm: 914.4 },
        imperial,
      ),
    ).toEqual(['mix 68 °F', 'pipe 57 °F', 'kit A-17', 'packer 8 in packer', 'patch 36.0 in']);
    expect(eventDetails('bladder_inflated', { pressureKpa: 103 }, imperial)).toEqual(['14.9 psi']);
    expect(eventDetails('bladder_inflated', { pressureKpa: 103 }, { unitSystem: 'metric' })).toEqual(['103 kPa']);
    expect(eventDetails('dry_run_finished', { seconds: 210 }, imperial)).toEqual(['took 0:03:30']);
    expect(
      eventDetails(
        'checks_done',
        {
          items: [
            { id: 'a', ok: true },
            { id: 'b', ok: false },
          ],
        },
        imperial,
      ),
    ).toEqual(['1 of 2 checks ok']);
    expect(eventDetails('go_decision', { go: false, overrideReason: 'Owner accepts the risk' }, imperial)).toEqual([
      'NO-GO',
      '“Owner accepts the risk”',
    ]);
    expect(eventDetails('bladder_deflated', { reason: 'Flow backing up', confirmedEarly: true }, imperial)).toEqual([
      '“Flow backing up”',
    ]);
    expect(eventDetails('resin_mixed', {}, imperial)).toEqual([]);
  });

  it('shows a correction as before → after with its reason', () => {
    const target = {
      type: 'pressure_reading' as const,
      deviceTime: '2026-12-01T15:30:00Z',
      payload: { pressureKpa: 103 },
    };
    const time = (at: Date) => at.toISOString().slice(11, 16);
    expect(
      correctionDetails(
        { reason: 'Read the wrong gauge', payload: { pressureKpa: 99 }, deviceTime: '2026-12-01T15:32:00Z' },
        target,
        { unitSystem: 'metric', time },
      ),
    ).toEqual(['time 15:30 → 15:32', '103 kPa → 99 kPa', 'why: “Read the wrong gauge”']);
  });
});

describe('flag helpers', () => {
  it('ranks critical over warning over none', () => {
    expect(worstRank([])).toBe(0);
    expect(worstSeverity([{ severity: 'warning' }])).toBe('warning');
    expect(worstSeverity([{ severity: 'warning' }, { severity: 'critical' }])).toBe('critical');
    expect(worstSeverity([])).toBeNull();
  });
  it('rewrites the UTC instants of a flag sentence', () => {
    const text = 'Inflated at 2026-12-01T19:26:00Z, after the inflate-by time 2026-12-01T19:22:30.500Z: late.';
    expect(localiseSentence(text, (at) => `<${at.getUTCHours()}:${at.getUTCMinutes()}>`)).toBe(
      'Inflated at <19:26>, after the inflate-by time <19:22>: late.',
    );
  });
});
