export { bestClockSample, clockSample } from './clockOffset';
export type { ClockSample } from './clockOffset';
export { createIoHostSocket } from './createIoHostSocket';
export { HostConnection } from './HostConnection';
export type { HostConnectionOptions, HostSocketFactory } from './HostConnection';
export type { HostSocket } from './HostSocket';
export { closeHostSession, openHostSession, resyncHostSession, sendHostCommand, setHostSocketFactory } from './hostSession';
