export { ReconnectBanner } from './components/ReconnectBanner';
export { RemovedScreen } from './components/RemovedScreen';
export type { RemovedScreenProps } from './components/RemovedScreen';
