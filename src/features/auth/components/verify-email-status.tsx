import { LoaderCircle } from 'lucide-react';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { verifyEmailInput } from '@shared/schemas/auth';
import { buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useVerifyEmail } from '../api/verify-email';

/** Sends the token from the mail link as soon as the page opens and shows how it went. */
export function VerifyEmailStatus({ token }: { token: string | null }) {
  const verify = useVerifyEmail();
  const { mutate } = verify;
  const sentFor = useRef<string | null>(null);
  const tokenIsWellFormed = verifyEmailInput.safeParse({ token }).success;

  useEffect(() => {
    // Once per token, even when React runs effects twice in development.
    if (!token || !tokenIsWellFormed || sentFor.current === token) return;
    sentFor.current = token;
    mutate({ token });
  }, [token, tokenIsWellFormed, mutate]);

  if (!token || !tokenIsWellFormed) {
    return (
      <Notice tone="warn" role="alert" title="This verification link is incomplete">
        Open the link from the e-mail again, or copy the whole address into the browser. You can ask for a new mail
        from your <Link className="underline" to={paths.account.root.getHref()}>account page</Link>.
      </Notice>
    );
  }

  if (verify.isSuccess) {
    return (
      <div className="space-y-4">
        <Notice tone="ok" role="status" title="Your e-mail address is verified">
          Thanks, {verify.data.displayName}. You can now order parts and apply to sell.
        </Notice>
        <Link to={paths.account.root.getHref()} className={buttonClasses('primary')}>
          Go to your account
        </Link>
      </div>
    );
  }

  if (verify.isError) {
    return (
      <Notice tone="danger" role="alert" title="We could not verify your e-mail address">
        <p>{verify.error.message}</p>
        <p className="mt-2">
          The link may have expired or been used already. Sign in and ask for a new one from your{' '}
          <Link className="underline" to={paths.account.root.getHref()}>account page</Link>.
        </p>
      </Notice>
    );
  }

  return (
    <p role="status" className="flex items-center gap-2 text-ink-soft">
      <LoaderCircle aria-hidden="true" className="size-4 animate-spin" />
      Checking your verification link…
    </p>
  );
}
