import { describe, expect, it } from 'vitest';
import { createUpdateChannel, type RegisterCallbacks } from '../../src/offline/updates';

/** A stand-in for vite-plugin-pwa's registerSW: the test plays the service worker's part. */
function fakeWorker() {
  const log: string[] = [];
  let callbacks: RegisterCallbacks = {};
  const timers: { task: () => void; ms: number; repeat: boolean }[] = [];
  const channel = createUpdateChannel({
    register: (cb) => {
      callbacks = cb;
      return async (reloadPage) => {
        log.push(`take waiting version (${String(reloadPage)})`);
      };
    },
    beforeReload: () => log.push('flush saves'),
    reloadPage: () => log.push('reload'),
    checkEveryMs: 3_600_000,
    takeOverMs: 5_000,
    setInterval: (task, ms) => timers.push({ task, ms, repeat: true }),
    setTimeout: (task, ms) => timers.push({ task, ms, repeat: false }),
  });
  return { channel, log, timers, worker: () => callbacks };
}

describe('updates of the installed app', () => {
  it('a new version waiting is announced, and nothing reloads until the user chooses', () => {
    const { channel, log, worker } = fakeWorker();
    expect(channel.getState()).toEqual({ kind: 'none' });
    worker().onNeedRefresh?.();
    expect(channel.getState()).toEqual({ kind: 'waiting' });
    expect(log).toEqual([]);
  });

  it('on the user’s reload, the waiting version takes over and the page reloads after saving what is pending', () => {
    const { channel, log, worker } = fakeWorker();
    worker().onNeedRefresh?.();
    channel.reload();
    expect(channel.getState()).toEqual({ kind: 'reloading' });
    expect(log).toEqual(['take waiting version (true)']);
    // The new worker controls the page now.
    worker().onNeedReload?.();
    expect(log).toEqual(['take waiting version (true)', 'flush saves', 'reload']);
  });

  it('when another tab takes the new version, this page only says so; its reload is then a plain one', () => {
    const { channel, log, worker } = fakeWorker();
    worker().onNeedRefresh?.();
    worker().onNeedReload?.();
    expect(channel.getState()).toEqual({ kind: 'taken-elsewhere' });
    expect(log).toEqual([]);
    channel.reload();
    expect(log).toEqual(['flush saves', 'reload']);
  });

  it('a chosen reload happens even if the new version never takes over, and only once', () => {
    const { channel, log, worker, timers } = fakeWorker();
    worker().onNeedRefresh?.();
    channel.reload();
    const fallback = timers.find((t) => !t.repeat);
    expect(fallback?.ms).toBe(5_000);
    fallback?.task();
    worker().onNeedReload?.();
    expect(log).toEqual(['take waiting version (true)', 'flush saves', 'reload']);
  });

  it('"Later" puts the notice away; a reload with nothing waiting does nothing', () => {
    const { channel, log, worker } = fakeWorker();
    channel.reload();
    expect(log).toEqual([]);
    worker().onNeedRefresh?.();
    channel.dismiss();
    expect(channel.getState()).toEqual({ kind: 'none' });
    channel.reload();
    expect(log).toEqual([]);
  });

  it('an open page asks hourly for a new version, and a failed check (offline) is harmless', async () => {
    const { worker, timers } = fakeWorker();
    let checks = 0;
    const registration = {
      update: async () => {
        checks++;
        throw new TypeError('Failed to fetch');
      },
    } as unknown as ServiceWorkerRegistration;
    worker().onRegisteredSW?.('./sw.js', registration);
    const hourly = timers.find((t) => t.repeat);
    expect(hourly?.ms).toBe(3_600_000);
    hourly?.task();
    await Promise.resolve();
    expect(checks).toBe(1);
  });
});
