export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="cw-muted flex items-center gap-2 py-8">
      <span className="inline-block h-3 w-3 animate-pulse rounded-full bg-clay" aria-hidden="true" />
      Loading…
    </div>
  );
}
