// @vitest-environment jsdom
import { cleanup, renderHook } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { useWakeLock } from '@/lib/client/wake-lock';

function stubWakeLock() {
  const sentinels: { released: boolean; release: ReturnType<typeof vi.fn> }[] = [];
  const request = vi.fn(async () => {
    const sentinel = { released: false, release: vi.fn(async () => void (sentinel.released = true)) };
    sentinels.push(sentinel);
    return sentinel;
  });
  Object.defineProperty(navigator, 'wakeLock', { value: { request }, configurable: true });
  return { request, sentinels };
}

const flush = () => new Promise((resolve) => setTimeout(resolve, 0));

afterEach(() => {
  cleanup();
  Reflect.deleteProperty(navigator, 'wakeLock');
});

describe('useWakeLock', () => {
  it('holds the screen on while active and lets go when not', async () => {
    const { request, sentinels } = stubWakeLock();
    const { rerender } = renderHook(({ active }) => useWakeLock(active), { initialProps: { active: false } });
    await flush();
    expect(request).not.toHaveBeenCalled();

    rerender({ active: true });
    await flush();
    expect(request).toHaveBeenCalledWith('screen');

    rerender({ active: false });
    await flush();
    expect(sentinels[0].release).toHaveBeenCalled();
  });

  it('asks again when the page comes back into view after the browser dropped the lock', async () => {
    const { request, sentinels } = stubWakeLock();
    renderHook(() => useWakeLock(true));
    await flush();
    expect(request).toHaveBeenCalledTimes(1);
    // The browser releases the lock when the page is hidden.
    sentinels[0].released = true;
    document.dispatchEvent(new Event('visibilitychange'));
    await flush();
    expect(request).toHaveBeenCalledTimes(2);
  });

  it('does not ask twice while the lock is held', async () => {
    const { request } = stubWakeLock();
    renderHook(() => useWakeLock(true));
    await flush();
    document.dispatchEvent(new Event('visibilitychange'));
    await flush();
    expect(request).toHaveBeenCalledTimes(1);
  });

  it('does nothing where the API is missing', () => {
    expect(() => renderHook(() => useWakeLock(true))).not.toThrow();
  });
});
