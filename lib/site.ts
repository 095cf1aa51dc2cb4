/** Site-wide constants. SITE_URL is the public origin used in sitemap, robots and mail. */
export const SITE_NAME = 'Clackwater';
export const SITE_DESCRIPTION =
  'Field guides with live calculators, questions and answers with the numbers, and measured installations — for people who lift water with hydraulic ram pumps.';
export function siteUrl(): string {
  return (process.env.SITE_URL ?? `http://localhost:${process.env.PORT ?? 3000}`).replace(/\/$/, '');
}
