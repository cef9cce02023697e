/** Admin: accounts and roles; in development, the caught outbox of e-mails. */
import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useSession } from '../api/session.js';
import type { Role } from '../api/types.js';
import { outboxQuery, usersQuery, useCreateUser, useDeleteUser, useSetRole } from '../queries/users.js';
import { Field, FormError } from '../components/field.js';
import { QueryError } from '../components/query-error.js';
import { TableHead } from '../components/column-header.js';
import { NotFoundPage } from './not-found.js';

const ROLES: Role[] = ['admin', 'designer', 'tester'];

export function AdminPage() {
  const session = useSession();
  if (session?.user.role !== 'admin') return <NotFoundPage />;
  return (
    <div className="space-y-10">
      <h1>Admin</h1>
      <Accounts selfId={session.user.id} />
      <NewAccount />
      <Outbox />
    </div>
  );
}

function Accounts({ selfId }: { selfId: number }) {
  const [page, setPage] = useState(1);
  const users = useQuery(usersQuery({ page }));
  const setRole = useSetRole();
  const remove = useDeleteUser();
  if (users.isPending) return <p role="status">Loading accounts…</p>;
  if (users.isError) return <QueryError error={users.error} retry={() => users.refetch()} />;
  const pages = Math.max(1, Math.ceil(users.data.total / users.data.pageSize));
  return (
    <section aria-labelledby="accounts-title">
      <h2 id="accounts-title" className="mb-2">
        Accounts
      </h2>
      <FormError error={setRole.error ?? remove.error} />
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <TableHead
            columns={[
              { label: 'Name' },
              { label: 'E-mail' },
              { label: 'Role' },
              { label: <span className="sr-only">Actions</span> },
            ]}
          />
          <tbody>
            {users.data.items.map((u) => (
              <tr key={u.id} className="border-b border-slate-200 dark:border-slate-700">
                <td className="p-2">{u.name}</td>
                <td className="p-2">{u.email}</td>
                <td className="p-2">
                  <select
                    className="input w-auto"
                    aria-label={`Role of ${u.name}`}
                    value={u.role}
                    disabled={u.id === selfId}
                    onChange={(e) => setRole.mutate({ id: u.id, role: e.target.value as Role })}
                  >
                    {ROLES.map((r) => (
                      <option key={r}>{r}</option>
                    ))}
                  </select>
                </td>
                <td className="p-2">
                  {u.id !== selfId && (
                    <button
                      type="button"
                      className="btn"
                      onClick={() => window.confirm(`Delete the account of ${u.name}?`) && remove.mutate(u.id)}
                    >
                      Delete
                    </button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <nav aria-label="Account pages" className="mt-2 flex items-center gap-2 text-sm">
        <button type="button" className="btn" disabled={page <= 1} onClick={() => setPage(page - 1)}>
          Previous page
        </button>
        <span>
          Page {page} of {pages}
        </span>
        <button type="button" className="btn" disabled={page >= pages} onClick={() => setPage(page + 1)}>
          Next page
        </button>
      </nav>
    </section>
  );
}

function NewAccount() {
  const create = useCreateUser();
  const [form, setForm] = useState({ name: '', email: '', role: 'designer' as Role, password: '' });
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(form, { onSuccess: () => setForm({ name: '', email: '', role: 'designer', password: '' }) });
  };
  return (
    <form onSubmit={submit} className="max-w-md" aria-labelledby="new-account-title">
      <h2 id="new-account-title" className="mb-2">
        New account
      </h2>
      <FormError error={create.error} />
      {create.isSuccess && <p role="status">Account created.</p>}
      <Field label="Name" required value={form.name} onChange={(e) => setForm({ ...form, name: e.target.value })} />
      <Field
        label="E-mail"
        type="email"
        required
        value={form.email}
        onChange={(e) => setForm({ ...form, email: e.target.value })}
      />
      <label className="mb-4 block">
        <span className="label">Role</span>
        <select
          className="input"
          value={form.role}
          onChange={(e) => setForm({ ...form, role: e.target.value as Role })}
        >
          {ROLES.map((r) => (
            <option key={r}>{r}</option>
          ))}
        </select>
      </label>
      <Field
        label="First password"
        type="password"
        autoComplete="new-password"
        required
        minLength={8}
        value={form.password}
        onChange={(e) => setForm({ ...form, password: e.target.value })}
      />
      <button type="submit" className="btn btn-primary" disabled={create.isPending}>
        Create account
      </button>
    </form>
  );
}

function Outbox() {
  const outbox = useQuery(outboxQuery());
  // The server answers 404 in production: there is no outbox to show, so say nothing.
  if (outbox.isError) return null;
  return (
    <section aria-labelledby="outbox-title">
      <h2 id="outbox-title" className="mb-2">
        Outbox (development)
      </h2>
      {outbox.isPending && <p role="status">Loading mail…</p>}
      {outbox.data?.items.length === 0 && <p className="muted text-sm">No mail sent yet.</p>}
      <ul className="space-y-3">
        {outbox.data?.items.map((m) => (
          <li key={m.id} className="card text-sm">
            <p className="font-semibold">{m.subject}</p>
            <p className="muted">
              to {m.to.join(', ')} · {new Date(m.date).toLocaleString()}
            </p>
            <pre className="mt-2 whitespace-pre-wrap font-mono text-xs">{m.text}</pre>
          </li>
        ))}
      </ul>
    </section>
  );
}
