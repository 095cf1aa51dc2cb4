/** Empties the database (every migration down), migrates up and seeds the demo. Tests only. */
import { getSequelize } from '@/lib/db';
import { resetDatabase } from '@/tests/integration/reset';

resetDatabase(getSequelize())
  .then(() => getSequelize().close())
  .then(() => console.log('database reset and seeded'))
  .catch((err) => {
    console.error(`reset failed: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  });
