import type { ReactNode } from 'react';

/** The amber caution block: a symbol, a short title and plain words. */
export function Caution({ title = 'Caution', children }: { title?: string; children: ReactNode }) {
  return (
    <aside
      role="note"
      aria-label={title}
      className="my-4 flex gap-3 rounded-md border-l-4 border-signal bg-signal-100 p-4 text-creek-900 dark:bg-signal-900 dark:text-signal-100"
    >
      <svg
        viewBox="0 0 24 24"
        className="mt-0.5 h-6 w-6 flex-none text-signal-700 dark:text-signal-300"
        aria-hidden="true"
      >
        <path d="M12 2 1 21h22L12 2z" fill="currentColor" />
        <path d="M12 9v5" stroke="white" strokeWidth="2" strokeLinecap="round" />
        <circle cx="12" cy="17.5" r="1.2" fill="white" />
      </svg>
      <div className="font-sans text-sm leading-relaxed">
        <p className="font-semibold">{title}</p>
        <div>{children}</div>
      </div>
    </aside>
  );
}
