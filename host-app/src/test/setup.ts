import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

// Without vitest globals, Testing Library cannot register its own cleanup.
afterEach(() => cleanup());

// jsdom has no ResizeObserver; Radix's scroll areas (inside Table) need one to exist.
class NoopResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
globalThis.ResizeObserver ??= NoopResizeObserver;

// Lazy pages (the chart page pulls in recharts) can take over a second to load on a busy 2-core machine.
import { configure } from '@testing-library/react';
configure({ asyncUtilTimeout: 8_000 });
