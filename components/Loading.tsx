/** What a page shows while the server gathers its data (a segment's loading.tsx). */
export function Loading({ what }: { what: string }) {
  return (
    <p role="status" aria-busy="true" className="cw-muted font-sans">
      {`Loading ${what}…`}
    </p>
  );
}
