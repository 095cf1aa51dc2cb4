/** Clackwater's mark: a drop over the saw-tooth trace of a beating waste valve. */
export function Logo({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <path d="M16 3c4.5 6 8 10.2 8 14.2A8 8 0 0 1 8 17.2C8 13.2 11.5 9 16 3z" fill="currentColor" opacity="0.9" />
      <path
        d="M3 27h5l2-4 3 4h3l2-4 3 4h3l2-4 3 4"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.8"
        strokeLinejoin="round"
      />
    </svg>
  );
}
