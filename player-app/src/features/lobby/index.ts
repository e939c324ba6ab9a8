export { LobbyScreen } from './components/LobbyScreen';
