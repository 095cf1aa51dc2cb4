/**
 * Shown in place of content when the database does not answer. `data-cw-outage` tells
 * the server's response cache (scripts/response-cache.mjs) never to keep the page.
 */
export function ServiceUnavailable({ what = 'this page' }: { what?: string }) {
  return (
    <div role="alert" data-cw-outage="" className="cw-card border-signal">
      <h2 className="text-lg font-semibold">We can’t reach the database right now</h2>
      <p className="cw-muted mt-2">
        {`Clackwater could not load ${what}. Nothing has been lost; please try again in a minute.`}
      </p>
    </div>
  );
}
