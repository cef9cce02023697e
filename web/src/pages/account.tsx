/** Account: change of password, and personal access tokens for the CLI (the secret shown once, then only the name). */
import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useSession } from '../api/session.js';
import { useChangePassword } from '../queries/auth.js';
import { tokensQuery, useCreateToken, useRevokeToken } from '../queries/tokens.js';
import { Field, FormError } from '../components/field.js';
import { useNewPassword } from '../components/new-password-fields.js';
import { QueryError } from '../components/query-error.js';
import { CopyButton } from '../components/copy-button.js';

export function AccountPage() {
  const session = useSession();
  return (
    <div className="grid max-w-4xl gap-8 md:grid-cols-2">
      <h1 className="md:col-span-2">Account</h1>
      <p className="md:col-span-2">
        {session?.user.name} · {session?.user.email} · {session?.user.role}
      </p>
      <ChangePassword />
      <Tokens />
    </div>
  );
}

export function ChangePassword() {
  const change = useChangePassword();
  const [current, setCurrent] = useState('');
  const fresh = useNewPassword();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!fresh.validate()) return;
    change.mutate(
      { current, password: fresh.password },
      {
        onSuccess: () => {
          setCurrent('');
          fresh.clear();
        },
      },
    );
  };
  return (
    <form onSubmit={submit} aria-labelledby="change-password-title">
      <h2 id="change-password-title" className="mb-4">
        Change password
      </h2>
      {change.isSuccess && (
        <p role="status" className="mb-4">
          Your password has been changed.
        </p>
      )}
      <FormError error={fresh.problem ? new Error(fresh.problem) : change.error} />
      <Field
        label="Current password"
        type="password"
        autoComplete="current-password"
        required
        value={current}
        onChange={(e) => setCurrent(e.target.value)}
      />
      {fresh.fields}
      <button type="submit" className="btn btn-primary" disabled={change.isPending}>
        Change password
      </button>
    </form>
  );
}

function Tokens() {
  const tokens = useQuery(tokensQuery());
  const create = useCreateToken();
  const revoke = useRevokeToken();
  const [name, setName] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ name }, { onSuccess: () => setName('') });
  };
  return (
    <section aria-labelledby="tokens-title">
      <h2 id="tokens-title" className="mb-2">
        Access tokens for the command line
      </h2>
      <p className="muted mb-4 text-sm">
        Use a token with <code className="font-mono">fourfold login --token</code>. It is shown once; keep it somewhere
        safe.
      </p>
      <form onSubmit={submit}>
        <FormError error={create.error} />
        <Field
          label="Token name"
          required
          maxLength={100}
          value={name}
          onChange={(e) => setName(e.target.value)}
          hint="For example the computer it is for."
        />
        <button type="submit" className="btn" disabled={create.isPending}>
          Create token
        </button>
      </form>
      {create.data && (
        <div role="status" className="card mt-4">
          <p className="font-semibold">Your new token (shown only now):</p>
          <code className="mt-1 block break-all font-mono text-sm" data-testid="new-token">
            {create.data.token}
          </code>
          <CopyButton text={create.data.token} label="Copy token" />
        </div>
      )}
      {tokens.isPending && <p role="status">Loading tokens…</p>}
      {tokens.isError && <QueryError error={tokens.error} retry={() => tokens.refetch()} />}
      {tokens.data && (
        <ul className="mt-4 space-y-2" aria-label="Your tokens">
          {tokens.data.items.length === 0 && <li className="muted text-sm">No tokens yet.</li>}
          {tokens.data.items.map((t) => (
            <li key={t.id} className="flex items-center justify-between gap-2 text-sm">
              <span>
                <span className="font-semibold">{t.name}</span>
                <span className="muted">
                  {' '}
                  · last used {t.lastUsedAt ? new Date(t.lastUsedAt).toLocaleDateString() : 'never'}
                </span>
              </span>
              <button
                type="button"
                className="btn"
                onClick={() => revoke.mutate(t.id)}
                aria-label={`Revoke token ${t.name}`}
              >
                Revoke
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
