import { useState, type FormEvent } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { ApiError } from '../api/client.js';
import { useSession } from '../api/session.js';
import { useSignIn } from '../queries/auth.js';
import { Field, FormError } from '../components/field.js';

/** Only same-site paths, so a crafted link cannot send someone elsewhere after signing in. */
const safeNext = (next: string | null): string =>
  next && next.startsWith('/') && !next.startsWith('//') ? next : '/library';

export function SignInPage() {
  const session = useSession();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const next = safeNext(params.get('next'));
  if (session && !signIn.isSuccess) return <Navigate to={next} replace />;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    signIn.mutate({ email, password }, { onSuccess: () => navigate(next, { replace: true }) });
  };
  // The same words for an unknown address and a wrong password: the page never says which.
  const error =
    signIn.error instanceof ApiError && signIn.error.code === 'invalid-credentials'
      ? new Error('That e-mail and password do not match an account.')
      : signIn.error;
  return (
    <form onSubmit={submit} className="mx-auto max-w-sm" aria-labelledby="sign-in-title">
      <h1 id="sign-in-title" className="mb-6">
        Sign in
      </h1>
      <FormError error={error} />
      <Field
        label="E-mail"
        type="email"
        autoComplete="username"
        required
        value={email}
        onChange={(e) => setEmail(e.target.value)}
      />
      <Field
        label="Password"
        type="password"
        autoComplete="current-password"
        required
        value={password}
        onChange={(e) => setPassword(e.target.value)}
      />
      <button type="submit" className="btn btn-primary w-full" disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </button>
      <p className="mt-4 text-sm">
        <Link className="link" to="/forgot-password">
          Forgotten your password?
        </Link>
      </p>
    </form>
  );
}
