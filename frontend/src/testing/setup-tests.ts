import { afterEach } from 'vitest';
import { cleanup, configure } from '@testing-library/react';
import { clearSession } from '../lib/session.js';

// The machine is shared with other builds; give findBy*/waitFor more than the 1 s default.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  cleanup();
  // The session store caches in memory; reset it with storage so tests stay independent.
  clearSession();
  window.localStorage.clear();
});

// jsdom has no ResizeObserver; charts measure their container with it.
class ResizeObserverStub {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver ??= ResizeObserverStub as unknown as typeof ResizeObserver;
