import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterEach, beforeEach } from 'vitest';
import { configureRealtime, PlayerSocket } from '@/realtime';
import { useConnectionStore } from '@/stores/useConnectionStore';
import { useGameStore } from '@/stores/useGameStore';
import { useSessionStore } from '@/stores/useSessionStore';
import { FakeSocket } from './fakeSocket';

// No test touches the network: the app's socket is a fake unless a test installs its own.
beforeEach(() => {
  configureRealtime({ socket: new PlayerSocket({ createSocket: async () => new FakeSocket().asTransport() }) });
});

// Vitest runs without globals, so Testing Library cannot register its own cleanup.
afterEach(() => {
  cleanup();
  localStorage.clear();
  useGameStore.getState().reset();
  useConnectionStore.getState().reset();
  useSessionStore.getState().reset();
});
