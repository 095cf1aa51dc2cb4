import Link from 'next/link';
import type { ReactNode } from 'react';

/** A section of the site that has its place in the header but is still being built. */
export function ComingSoon({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="font-serif text-3xl font-semibold">{title}</h1>
      <div className="cw-prose">{children}</div>
      <p>
        <Link href="/questions" className="cw-link">
          Meanwhile, read the questions →
        </Link>
      </p>
    </div>
  );
}
