// Ways a tablet can get a crew's attention at a deadline: a beep, a buzz, a system
// notification. Each is a no-op where the browser lacks it, so callers simply call all three.

type AudioContextClass = typeof AudioContext;

let context: AudioContext | null = null;

/**
 * Creates or resumes the audio context. Browsers only allow sound after a user gesture, so
 * call this from a tap (installAudioUnlock does it on the first one).
 */
export function unlockAudio(): void {
  const Context = audioContextClass();
  if (!Context) return;
  try {
    context ??= new Context();
    if (context.state !== 'running') void context.resume().catch(() => undefined);
  } catch {
    context = null;
  }
}

/** Unlocks audio on the first tap or key press anywhere; returns a function that stops listening. */
export function installAudioUnlock(): () => void {
  if (typeof window === 'undefined') return () => undefined;
  const events = ['pointerdown', 'keydown', 'touchend'] as const;
  const stop = () => events.forEach((name) => window.removeEventListener(name, onGesture, true));
  function onGesture() {
    unlockAudio();
    if (context?.state === 'running') stop();
  }
  events.forEach((name) => window.addEventListener(name, onGesture, true));
  return stop;
}

export type AlarmSound = 'warning' | 'urgent';

// Square waves in the 800–1000 Hz band carry over traffic and pumps better than a soft sine;
// the urgent pattern alternates pitch so it is not mistaken for the warning.
const PATTERNS: Record<AlarmSound, { hz: number; ms: number }[]> = {
  warning: [
    { hz: 880, ms: 180 },
    { hz: 880, ms: 180 },
    { hz: 880, ms: 180 },
  ],
  urgent: [
    { hz: 988, ms: 220 },
    { hz: 784, ms: 220 },
    { hz: 988, ms: 220 },
    { hz: 784, ms: 220 },
    { hz: 988, ms: 400 },
  ],
};
const GAP_MS = 120;

/** Beeps a pattern; false when sound is unavailable or not yet unlocked by a tap. */
export function soundAlarm(sound: AlarmSound = 'warning'): boolean {
  unlockAudio();
  if (!context) return false;
  try {
    const gain = context.createGain();
    gain.connect(context.destination);
    let t = context.currentTime + 0.02;
    for (const { hz, ms } of PATTERNS[sound]) {
      const oscillator = context.createOscillator();
      oscillator.type = 'square';
      oscillator.frequency.setValueAtTime(hz, t);
      // Short ramps in and out: a hard edge clicks and sounds like a fault.
      gain.gain.setValueAtTime(0, t);
      gain.gain.linearRampToValueAtTime(0.5, t + 0.01);
      gain.gain.setValueAtTime(0.5, t + ms / 1000 - 0.01);
      gain.gain.linearRampToValueAtTime(0, t + ms / 1000);
      oscillator.connect(gain);
      oscillator.start(t);
      oscillator.stop(t + ms / 1000);
      t += (ms + GAP_MS) / 1000;
    }
    return context.state === 'running';
  } catch {
    return false;
  }
}

/** Buzzes where the device can (most Android tablets; not iPadOS). */
export function vibrate(pattern: number | number[] = [300, 150, 300, 150, 600]): boolean {
  if (typeof navigator === 'undefined' || typeof navigator.vibrate !== 'function') return false;
  try {
    return navigator.vibrate(pattern);
  } catch {
    return false;
  }
}

export type NotificationAccess = NotificationPermission | 'unsupported';

/** Asks once (call it from a tap); answers 'unsupported' where there are no notifications. */
export async function requestNotificationPermission(): Promise<NotificationAccess> {
  if (typeof Notification === 'undefined') return 'unsupported';
  if (Notification.permission !== 'default') return Notification.permission;
  try {
    return await Notification.requestPermission();
  } catch {
    return 'unsupported';
  }
}

/**
 * Shows a system notification when permitted; false otherwise. Goes through the service
 * worker where there is one: Android's Chrome refuses `new Notification()` in a page.
 * A `tag` replaces the earlier notification of the same clock instead of stacking.
 */
export async function notify(title: string, body: string, tag?: string): Promise<boolean> {
  if (typeof Notification === 'undefined' || Notification.permission !== 'granted') return false;
  const options: NotificationOptions = { body, tag, requireInteraction: true };
  try {
    const registration = await navigator.serviceWorker?.getRegistration();
    if (registration) {
      await registration.showNotification(title, options);
      return true;
    }
    new Notification(title, options);
    return true;
  } catch {
    return false;
  }
}

function audioContextClass(): AudioContextClass | undefined {
  if (typeof window === 'undefined') return undefined;
  return window.AudioContext ?? (window as unknown as { webkitAudioContext?: AudioContextClass }).webkitAudioContext;
}
