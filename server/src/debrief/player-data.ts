/**
 * A player whose data was deleted keeps an anonymised row, so the debrief can count them
 * as removed and team membership stays consistent: the nickname is replaced and the
 * nickname key carries this prefix. It starts with a control character, which checkNickname
 * refuses, so no real nickname can look deleted.
 */
export const DELETED_NICKNAME_KEY_PREFIX = '\u0001deleted:';
export const DELETED_NICKNAME = 'Removed student';

export const isDeletedNicknameKey = (key: string): boolean => key.startsWith(DELETED_NICKNAME_KEY_PREFIX);
