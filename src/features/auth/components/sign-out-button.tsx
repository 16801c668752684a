import { useNavigate } from 'react-router';
import { paths } from '../../../config/paths';
import { useSignOut } from '../api/sign-out';

export function SignOutButton() {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <button
      type="button"
      disabled={signOut.isPending}
      aria-describedby={signOut.isError ? 'sign-out-problem' : undefined}
      onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.auth.signIn.href()) })}
      className="rounded-md border border-paper/40 px-3 py-1 text-sm font-semibold text-paper hover:bg-paper/10 disabled:opacity-60"
    >
      {signOut.isPending ? 'Signing out…' : 'Sign out'}
      {signOut.isError ? (
        <span id="sign-out-problem" role="alert" className="sr-only">
          Sign-out failed; try again.
        </span>
      ) : null}
    </button>
  );
}
