import { UNITS_COOKIE } from './preference';

/**
 * Runs in <head> before the page paints: copies the reader's unit system from its
 * cookie to `<html data-units>`, so a page built once for everyone (a guide) shows
 * only the reader's units from the first frame (CSS hides the other system). Any
 * value but "metric" is the default, US, as parseUnitPreference reads it.
 *
 * It also tells zod, before any bundle loads, not to probe for eval (its JIT check calls
 * Function(""), which the Content-Security-Policy blocks and reports as a violation):
 * zod keeps its settings on globalThis.__zod_globalConfig and only fills it if unset.
 *
 * It is an inline script: static pages allow it by the hash of their built HTML, pages
 * rendered per request by its hash in the policy (proxy.ts), as it carries no nonce.
 */
export const UNITS_FIRST_PAINT_SCRIPT = `globalThis.__zod_globalConfig=Object.assign(globalThis.__zod_globalConfig||{},{jitless:true});document.documentElement.setAttribute("data-units",/(?:^|; )${UNITS_COOKIE}=metric(?:;|$)/.test(document.cookie)?"metric":"US")`;
