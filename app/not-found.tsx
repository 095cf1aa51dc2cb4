import Link from 'next/link';

export default function NotFound() {
  return (
    <div className="cw-card mx-auto max-w-prose">
      <h1 className="font-serif text-2xl font-semibold">Nothing here</h1>
      <p className="cw-muted mt-2">That page has gone downstream. Try the guides or the questions instead.</p>
      <p className="mt-4 flex gap-4">
        <Link href="/guides" className="cw-link">
          Guides
        </Link>
        <Link href="/questions" className="cw-link">
          Questions
        </Link>
      </p>
    </div>
  );
}
