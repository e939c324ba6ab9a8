export { JoinForm } from './components/JoinForm';
export type { JoinFormProps } from './components/JoinForm';
export { JoinedNotice } from './components/JoinedNotice';
export type { JoinedNoticeProps } from './components/JoinedNotice';
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
