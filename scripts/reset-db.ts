/** Empties the database (every migration down), migrates up, seeds the demo and drops the saved thread pages. Tests only. */
import { getSequelize } from '@/lib/db';
import { forgetSavedPages } from '@/lib/questions/saved-pages';
import { resetDatabase } from '@/tests/support/reset';

resetDatabase(getSequelize())
  .then(() => getSequelize().close())
  .then(() => forgetSavedPages())
  .then(() => console.log('database reset and seeded'))
  .catch((err) => {
    console.error(`reset failed: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  });
