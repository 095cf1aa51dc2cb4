/**
 * npm run search:rebuild — rebuilds the search index from the database and
 * content/guides. With MEILISEARCH_URL set it rebuilds the shared Meilisearch index;
 * otherwise it checks the in-process index builds, and marks every running server's
 * in-process index for a rebuild on its next search.
 */
import { getSequelize } from '@/lib/db';
import { rebuildIndex, searchEngine, stampRebuild } from '@/lib/search';

async function main() {
  try {
    const { documents, ms } = await rebuildIndex();
    stampRebuild();
    console.log(`search index rebuilt (${searchEngine().name}): ${documents} documents in ${(ms / 1000).toFixed(1)} s`);
  } finally {
    await getSequelize().close();
  }
}

main().catch((err) => {
  console.error(`search rebuild failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
