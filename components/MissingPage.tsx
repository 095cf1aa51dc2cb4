import Link from 'next/link';

/** A segment's own not-found page: what is missing and where to look instead. */
export function MissingPage({
  title,
  text,
  links,
}: {
  title: string;
  text: string;
  links: { href: string; label: string }[];
}) {
  return (
    <div className="cw-card mx-auto max-w-prose">
      <h1 className="font-serif text-2xl font-semibold">{title}</h1>
      <p className="cw-muted mt-2">{text}</p>
      <p className="mt-4 flex gap-4">
        {links.map((l) => (
          <Link key={l.href} href={l.href} className="cw-link">
            {l.label}
          </Link>
        ))}
      </p>
    </div>
  );
}
