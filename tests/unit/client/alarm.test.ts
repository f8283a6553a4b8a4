// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';

// The audio context lives in the module, so each test imports a fresh copy.
async function load() {
  vi.resetModules();
  return import('@/lib/client/alarm');
}

class FakeAudioContext {
  static instances: FakeAudioContext[] = [];
  state: 'suspended' | 'running' = 'suspended';
  currentTime = 10;
  destination = {};
  oscillators: { hz: number; start: number; stop: number }[] = [];
  constructor() {
    FakeAudioContext.instances.push(this);
  }
  resume = vi.fn(async () => {
    this.state = 'running';
  });
  createGain() {
    const param = { setValueAtTime: vi.fn(), linearRampToValueAtTime: vi.fn() };
    return { gain: param, connect: vi.fn() };
  }
  createOscillator() {
    const record = { hz: 0, start: 0, stop: 0 };
    this.oscillators.push(record);
    return {
      type: 'sine',
      frequency: { setValueAtTime: (hz: number) => (record.hz = hz) },
      connect: vi.fn(),
      start: (t: number) => (record.start = t),
      stop: (t: number) => (record.stop = t),
    };
  }
}

beforeEach(() => {
  FakeAudioContext.instances = [];
});
afterEach(() => {
  vi.unstubAllGlobals();
});

describe('unlockAudio and soundAlarm', () => {
  it('makes and resumes one audio context, then beeps three 880 Hz tones in a row', async () => {
    vi.stubGlobal('AudioContext', FakeAudioContext);
    const { soundAlarm, unlockAudio } = await load();
    unlockAudio();
    unlockAudio();
    await Promise.resolve();
    expect(FakeAudioContext.instances).toHaveLength(1);
    expect(FakeAudioContext.instances[0].resume).toHaveBeenCalled();

    expect(soundAlarm()).toBe(true);
    const beeps = FakeAudioContext.instances[0].oscillators;
    expect(beeps.map((b) => b.hz)).toEqual([880, 880, 880]);
    for (let i = 1; i < beeps.length; i += 1) expect(beeps[i].start).toBeGreaterThan(beeps[i - 1].stop);
  });

  it('plays a longer two-pitch pattern when urgent', async () => {
    vi.stubGlobal('AudioContext', FakeAudioContext);
    const { soundAlarm, unlockAudio } = await load();
    unlockAudio();
    await Promise.resolve();
    soundAlarm('urgent');
    expect(new Set(FakeAudioContext.instances[0].oscillators.map((b) => b.hz))).toEqual(new Set([988, 784]));
  });

  it('unlocks on the first tap anywhere, then stops listening', async () => {
    vi.stubGlobal('AudioContext', FakeAudioContext);
    const { installAudioUnlock } = await load();
    installAudioUnlock();
    window.dispatchEvent(new Event('pointerdown'));
    await Promise.resolve();
    expect(FakeAudioContext.instances[0]?.state).toBe('running');
    window.dispatchEvent(new Event('pointerdown'));
    expect(FakeAudioContext.instances[0].resume).toHaveBeenCalledTimes(1);
  });

  it('is a no-op without Web Audio', async () => {
    const { soundAlarm } = await load();
    expect(soundAlarm()).toBe(false);
  });
});

describe('vibrate', () => {
  it('buzzes where navigator.vibrate exists', async () => {
    const vibrateSpy = vi.fn(() => true);
    Object.defineProperty(navigator, 'vibrate', { value: vibrateSpy, configurable: true });
    const { vibrate } = await load();
    expect(vibrate()).toBe(true);
    expect(vibrateSpy).toHaveBeenCalledWith([300, 150, 300, 150, 600]);
    Reflect.deleteProperty(navigator, 'vibrate');
    expect(vibrate()).toBe(false);
  });
});

describe('notifications', () => {
  function stubNotification(permission: NotificationPermission) {
    const constructed: [string, NotificationOptions | undefined][] = [];
    const FakeNotification = Object.assign(
      function (this: unknown, title: string, options?: NotificationOptions) {
        constructed.push([title, options]);
      },
      { permission, requestPermission: vi.fn(async () => 'granted' as const) },
    );
    vi.stubGlobal('Notification', FakeNotification);
    return { constructed, FakeNotification };
  }

  it('asks for permission only while undecided', async () => {
    const { FakeNotification } = stubNotification('default');
    const { requestNotificationPermission } = await load();
    await expect(requestNotificationPermission()).resolves.toBe('granted');
    FakeNotification.permission = 'denied';
    await expect(requestNotificationPermission()).resolves.toBe('denied');
    expect(FakeNotification.requestPermission).toHaveBeenCalledTimes(1);
  });

  it('shows nothing without permission', async () => {
    const { constructed } = stubNotification('default');
    const { notify } = await load();
    await expect(notify('Setline', 'Time is up.')).resolves.toBe(false);
    expect(constructed).toEqual([]);
  });

  it('goes through the service worker registration when there is one, else the page', async () => {
    const { constructed } = stubNotification('granted');
    const showNotification = vi.fn(async () => undefined);
    Object.defineProperty(navigator, 'serviceWorker', {
      value: { getRegistration: async () => ({ showNotification }) },
      configurable: true,
    });
    const { notify } = await load();
    await expect(notify('Inflate by', '1 minute left.', 'inflate')).resolves.toBe(true);
    expect(showNotification).toHaveBeenCalledWith(
      'Inflate by',
      expect.objectContaining({ body: '1 minute left.', tag: 'inflate' }),
    );

    Object.defineProperty(navigator, 'serviceWorker', {
      value: { getRegistration: async () => undefined },
      configurable: true,
    });
    await expect(notify('Inflate by', 'Time is up.')).resolves.toBe(true);
    expect(constructed).toEqual([['Inflate by', expect.objectContaining({ body: 'Time is up.' })]]);
    Reflect.deleteProperty(navigator, 'serviceWorker');
  });
});
