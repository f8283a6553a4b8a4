import { describe, expect, it } from 'vitest';
import {
  installAudioUnlock,
  notify,
  requestNotificationPermission,
  soundAlarm,
  unlockAudio,
  vibrate,
} from '@/lib/client/alarm';

// Node has no window, audio, vibration or notifications: like an old browser, every call is a quiet no-op.
describe('alarm without browser support', () => {
  it('does nothing and says so', async () => {
    expect(() => unlockAudio()).not.toThrow();
    expect(installAudioUnlock()).toBeTypeOf('function');
    expect(soundAlarm()).toBe(false);
    expect(vibrate()).toBe(false);
    await expect(notify('Setline', 'Time is up.')).resolves.toBe(false);
    await expect(requestNotificationPermission()).resolves.toBe('unsupported');
  });
});
