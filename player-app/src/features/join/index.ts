export { JoinForm } from './components/JoinForm';
export { RosterPicker } from './components/RosterPicker';
export type { RosterPickerProps } from './components/RosterPicker';
export { useJoinInfo } from './hooks/useJoinInfo';
export type { JoinFormProps } from './components/JoinForm';
export { PrivacyNote } from './components/PrivacyNote';
export {
  JOIN_CODE_ALPHABET,
  JOIN_CODE_LENGTH,
  invalidJoinCodeCharacters,
  isValidJoinCode,
  normaliseJoinCode,
} from './utils/joinCode';
export { readJoinCodeFromUrl } from './utils/readJoinCodeFromUrl';
export {
  NICKNAME_MAX_LENGTH,
  normaliseNickname,
  validateJoin,
  validateJoinCode,
  validateNickname,
} from './utils/validateJoin';
export type { JoinFieldErrors, JoinFormValues, JoinValidation } from './utils/validateJoin';
