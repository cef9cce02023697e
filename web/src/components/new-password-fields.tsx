/** A new password typed twice, with the server's length rule checked before sending. */
import { useState } from 'react';
import { Field } from './field.js';

export const MIN_PASSWORD = 8;
export const MAX_PASSWORD = 200;

export function passwordProblem(password: string, repeat: string): string | null {
  if (password.length < MIN_PASSWORD) return `The password needs at least ${MIN_PASSWORD} characters.`;
  if (password.length > MAX_PASSWORD) return `The password can have at most ${MAX_PASSWORD} characters.`;
  if (password !== repeat) return 'The two passwords are not the same.';
  return null;
}

export function NewPasswordFields(props: {
  password: string;
  repeat: string;
  onPassword(v: string): void;
  onRepeat(v: string): void;
}) {
  return (
    <>
      <Field
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD} characters.`}
        value={props.password}
        onChange={(e) => props.onPassword(e.target.value)}
      />
      <Field
        label="New password again"
        type="password"
        autoComplete="new-password"
        value={props.repeat}
        onChange={(e) => props.onRepeat(e.target.value)}
      />
    </>
  );
}

/** The two fields' state, and a check that shows the problem (if any) before anything is sent. */
export function useNewPassword() {
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  return {
    password,
    problem,
    fields: <NewPasswordFields password={password} repeat={repeat} onPassword={setPassword} onRepeat={setRepeat} />,
    validate(): boolean {
      const p = passwordProblem(password, repeat);
      setProblem(p);
      return p === null;
    },
    clear(): void {
      setPassword('');
      setRepeat('');
    },
  };
}
