import Link from 'next/link';

/** A page someone may not see: its title, the policy's plain words, and a sign-in link when signed out. */
export function Refused({
  title,
  message,
  signedIn,
  signInTo,
}: {
  title: string;
  message: string;
  signedIn: boolean;
  signInTo?: string;
}) {
  return (
    <div className="flex max-w-2xl flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">{title}</h1>
      <p className="cw-card font-sans" role="alert">
        {message}{' '}
        {signedIn || !signInTo ? null : (
          <Link href={`/sign-in?callbackUrl=${signInTo}`} className="cw-link">
            Sign in
          </Link>
        )}
      </p>
    </div>
  );
}
