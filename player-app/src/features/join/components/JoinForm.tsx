import { useId, useRef, useState, type ChangeEvent, type FormEvent } from 'react';
import { joinSession, joinWithRosterEntry, type RosterChoice } from '@/realtime';
import { useJoinInfo } from '../hooks/useJoinInfo';
import { isValidJoinCode, normaliseJoinCode } from '../utils/joinCode';
import { validateJoin, validateJoinCode, type JoinFieldErrors } from '../utils/validateJoin';
import { RosterPicker } from './RosterPicker';

type JoinMode = 'roster' | 'nickname';

export interface JoinFormProps {
  /** A code carried by the link the player opened (QR code on the board), already normalised. */
  initialCode?: string;
}

export function JoinForm({ initialCode = '' }: JoinFormProps) {
  const [code, setCode] = useState(initialCode);
  const [nickname, setNickname] = useState('');
  const [errors, setErrors] = useState<JoinFieldErrors>({});
  const [serverMessage, setServerMessage] = useState<string | null>(null);
  const [submitting, setSubmitting] = useState(false);
  const [mode, setMode] = useState<JoinMode>('roster');
  const [picked, setPicked] = useState<RosterChoice | null>(null);
  const info = useJoinInfo(code);
  const roster = info?.ok ? info.roster : null;
  const byRoster = roster !== null && mode === 'roster';
  const codeRef = useRef<HTMLInputElement>(null);
  const nicknameRef = useRef<HTMLInputElement>(null);

  const id = useId();
  const codeId = `${id}-code`;
  const nicknameId = `${id}-nickname`;

  function onCodeChange(event: ChangeEvent<HTMLInputElement>) {
    setCode(event.target.value.toUpperCase());
    setErrors((prev) => ({ ...prev, code: undefined }));
    setServerMessage(null);
  }

  function onNicknameChange(event: ChangeEvent<HTMLInputElement>) {
    setNickname(event.target.value);
    setErrors((prev) => ({ ...prev, nickname: undefined }));
    setServerMessage(null);
  }

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (submitting) return;
    if (byRoster) return submitRosterPick();
    const validation = validateJoin({ code, nickname });
    if (!validation.ok) {
      setErrors(validation.errors);
      (validation.errors.code ? codeRef : nicknameRef).current?.focus();
      return;
    }
    setErrors({});
    setServerMessage(null);
    setSubmitting(true);
    try {
      const result = await joinSession(validation.values.code, validation.values.nickname);
      if (!result.ok) setServerMessage(result.message);
    } finally {
      setSubmitting(false);
    }
  }

  async function submitRosterPick() {
    const codeError = validateJoinCode(code);
    const current = picked && roster?.find((r) => r.id === picked.id && !r.taken);
    if (codeError || !current) {
      setErrors({ code: codeError, nickname: current ? undefined : 'Pick your name from the list.' });
      if (codeError) codeRef.current?.focus();
      return;
    }
    setErrors({});
    setServerMessage(null);
    setSubmitting(true);
    try {
      const result = await joinWithRosterEntry(normaliseJoinCode(code), current.id, current.displayName);
      if (!result.ok) setServerMessage(result.message);
    } finally {
      setSubmitting(false);
    }
  }

  return (
    <form className="join-form" noValidate onSubmit={onSubmit} aria-busy={submitting}>
      <div className="field">
        <label htmlFor={codeId}>Join code</label>
        <p id={`${codeId}-hint`} className="field-hint">
          Six letters and numbers, shown on the board.
        </p>
        <input
          ref={codeRef}
          id={codeId}
          name="code"
          className="input input-code"
          type="text"
          inputMode="text"
          autoCapitalize="characters"
          autoComplete="off"
          autoCorrect="off"
          spellCheck={false}
          enterKeyHint="next"
          maxLength={12}
          value={code}
          onChange={onCodeChange}
          aria-invalid={errors.code ? true : undefined}
          aria-describedby={`${codeId}-hint${errors.code ? ` ${codeId}-error` : ''}`}
        />
        {errors.code && (
          <p id={`${codeId}-error`} className="field-error" role="alert">
            {errors.code}
          </p>
        )}
        <p className="field-hint" aria-live="polite">
          {info?.ok && `Session: ${info.sessionTitle}`}
          {info?.ok && info.joiningLocked && ' — joining is closed for now. Ask your teacher.'}
          {info && !info.ok && info.error !== 'network_error' && info.error !== 'bad_response' && info.message}
        </p>
      </div>

      {roster && (
        <fieldset className="join-mode">
          <legend>How do you want to join?</legend>
          <label className="choice">
            <input type="radio" name="mode" checked={mode === 'roster'} onChange={() => setMode('roster')} />
            Pick my name from the class list
          </label>
          <label className="choice">
            <input type="radio" name="mode" checked={mode === 'nickname'} onChange={() => setMode('nickname')} />
            Use a nickname
          </label>
        </fieldset>
      )}

      {byRoster && roster ? (
        <RosterPicker
          roster={roster}
          selectedId={picked?.id ?? null}
          error={errors.nickname}
          onPick={(entry) => {
            setPicked(entry);
            setErrors((prev) => ({ ...prev, nickname: undefined }));
            setServerMessage(null);
          }}
        />
      ) : (
        <div className="field">
          <label htmlFor={nicknameId}>Nickname</label>
          <p id={`${nicknameId}-hint`} className="field-hint">
            First name or a nickname — no surnames or e-mail addresses
          </p>
          <input
            ref={nicknameRef}
            id={nicknameId}
            name="nickname"
            className="input"
            type="text"
            autoComplete="off"
            autoCorrect="off"
            spellCheck={false}
            enterKeyHint="go"
            maxLength={40}
            // Arriving from the QR code, the code is done: go straight to the nickname.
            autoFocus={isValidJoinCode(initialCode)}
            value={nickname}
            onChange={onNicknameChange}
            aria-invalid={errors.nickname ? true : undefined}
            aria-describedby={`${nicknameId}-hint${errors.nickname ? ` ${nicknameId}-error` : ''}`}
          />
          {errors.nickname && (
            <p id={`${nicknameId}-error`} className="field-error" role="alert">
              {errors.nickname}
            </p>
          )}
        </div>
      )}

      {serverMessage && (
        <p className="form-error" role="alert">
          {serverMessage}
        </p>
      )}

      <button type="submit" className="button-primary" disabled={submitting}>
        {submitting ? 'Joining…' : 'Join'}
      </button>
    </form>
  );
}
