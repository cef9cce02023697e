/** Share links (create, copy, revoke), tester invitations, and who has access. */
import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { accessQuery, useCreateShare, useInviteTester, useRemoveTester, useRevokeShare } from '../queries/sharing.js';
import { CopyButton } from './copy-button.js';
import { Field, FormError } from './field.js';
import { QueryError } from './query-error.js';

const day = (iso: string) => new Date(iso).toLocaleDateString();

export function SharingPanel({ patternId }: { patternId: number }) {
  const access = useQuery(accessQuery(patternId));
  const create = useCreateShare(patternId);
  const revoke = useRevokeShare(patternId);
  const invite = useInviteTester(patternId);
  const remove = useRemoveTester(patternId);
  const [days, setDays] = useState('');
  const [email, setEmail] = useState('');

  const createLink = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(days ? { expiresInDays: Number(days) } : {});
  };
  const sendInvite = (e: FormEvent) => {
    e.preventDefault();
    invite.mutate({ email }, { onSuccess: () => setEmail('') });
  };

  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form onSubmit={createLink} aria-labelledby="share-link-title">
        <h3 id="share-link-title" className="mb-2 font-semibold">
          Share link
        </h3>
        <p className="muted mb-2 text-sm">
          Anyone with the link sees the chart, steps and tally, read-only, without signing in.
        </p>
        <FormError error={create.error ?? revoke.error} />
        <Field
          label="Expires after (days, empty for never)"
          type="number"
          min={1}
          max={365}
          value={days}
          onChange={(e) => setDays(e.target.value)}
        />
        <button type="submit" className="btn" disabled={create.isPending}>
          Create share link
        </button>
        {create.data && (
          <div role="status" className="card mt-3">
            <p className="text-sm font-semibold">New link (copy it now; it is not shown again):</p>
            <a className="link block break-all font-mono text-sm" href={create.data.url} data-testid="share-url">
              {create.data.url}
            </a>
            <CopyButton text={create.data.url} label="Copy link" />
          </div>
        )}
      </form>
      <form onSubmit={sendInvite} aria-labelledby="invite-title">
        <h3 id="invite-title" className="mb-2 font-semibold">
          Invite a tester
        </h3>
        <p className="muted mb-2 text-sm">
          They get an e-mail; a new tester chooses a password from it, then sees this pattern and can leave notes.
        </p>
        <FormError error={invite.error ?? remove.error} />
        {invite.isSuccess && (
          <p role="status" className="mb-2 text-sm">
            Invitation sent to {invite.data.tester.email}.
          </p>
        )}
        <Field label="Tester's e-mail" type="email" required value={email} onChange={(e) => setEmail(e.target.value)} />
        <button type="submit" className="btn" disabled={invite.isPending}>
          Send invitation
        </button>
      </form>
      <section aria-labelledby="access-title" className="md:col-span-2">
        <h3 id="access-title" className="mb-2 font-semibold">
          Who has access
        </h3>
        {access.isPending && <p role="status">Loading…</p>}
        {access.isError && <QueryError error={access.error} retry={() => access.refetch()} />}
        {access.data && (
          <ul className="space-y-2 text-sm">
            {access.data.testers.map((t) => (
              <li key={`t${t.id}`} className="flex flex-wrap items-center gap-2">
                <span>
                  Tester <strong>{t.name}</strong> ({t.email}), invited {day(t.invitedAt)}
                </span>
                <button
                  type="button"
                  className="btn"
                  onClick={() => remove.mutate(t.id)}
                  aria-label={`Remove ${t.email}`}
                >
                  Remove
                </button>
              </li>
            ))}
            {access.data.shares.map((s) => (
              <li key={`s${s.id}`} className="flex flex-wrap items-center gap-2">
                <span>
                  Link made {day(s.createdAt)}
                  {s.expiresAt ? `, expires ${day(s.expiresAt)}` : ', no expiry'}
                  {s.active ? '' : s.revoked ? ' (revoked)' : ' (expired)'}
                </span>
                {s.active && (
                  <button
                    type="button"
                    className="btn"
                    onClick={() => revoke.mutate(s.id)}
                    aria-label={`Revoke the link made ${day(s.createdAt)}`}
                  >
                    Revoke
                  </button>
                )}
              </li>
            ))}
            {access.data.testers.length === 0 && access.data.shares.length === 0 && <li>Only you.</li>}
          </ul>
        )}
      </section>
    </div>
  );
}
