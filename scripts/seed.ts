/** npm run db:seed — fills an empty database with the invented demo scenario. */
import { getSequelize } from '@/lib/db';
import { seedDemo } from '@/migrations/seed/demo';

async function main() {
  const sequelize = getSequelize();
  try {
    const seeded = await seedDemo(sequelize);
    console.log(seeded ? 'demo data seeded' : 'database already has members: demo seed skipped');
  } finally {
    await sequelize.close();
  }
}

main().catch((err) => {
  console.error(`seed failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
