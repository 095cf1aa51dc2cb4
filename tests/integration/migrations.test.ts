import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/db/migrator';
import { migrations } from '@/migrations';
import { seedDemo } from '@/migrations/seed/demo';
import { demoQuestions, demoUsers } from '@/migrations/seed/demo-data';
import { demoThreads } from '@/migrations/seed/demo-forum-data';
import { demoFieldLog } from '@/migrations/seed/demo-field-log';
import { demoSites, demoSiteTestCount } from '@/migrations/seed/demo-sites';
import { initModels } from '@/models';
import { assertTestDatabase } from '../support/reset';

const sequelize = getSequelize();
const migrator = createMigrator(sequelize);

async function tableNames(): Promise<string[]> {
  const rows = await sequelize.query<{ name: string }>(
    'SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()',
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name).sort();
}

describe('migrations round trip on the real MariaDB', () => {
  afterAll(async () => {
    await migrator.up();
    await seedDemo(sequelize);
  });

  it('goes up, seeds, reads back, goes down to zero and up again', async () => {
    assertTestDatabase(sequelize);
    await migrator.down({ to: 0 });
    expect(await tableNames()).toEqual(['schema_migrations']);

    const applied = await migrator.up();
    expect(applied.map((m) => m.name)).toEqual(migrations.map((m) => m.name));
    expect(await tableNames()).toEqual(
      expect.arrayContaining(['users', 'tags', 'questions', 'answers', 'question_tags']),
    );

    expect(await seedDemo(sequelize)).toBe(true);
    expect(await seedDemo(sequelize)).toBe(false); // a second seed writes nothing
    const { Question, User, Answer } = initModels(sequelize);
    expect(await User.count()).toBe(demoUsers.length);
    expect(await Question.count()).toBe(demoQuestions.length + demoThreads.length);
    expect(await Answer.count()).toBe([...demoQuestions, ...demoThreads].reduce((n, q) => n + q.answers.length, 0));
    const { FieldLogEntry, FieldLogTrial, FieldLogLink } = initModels(sequelize);
    // the demo sites' tests are field log entries too, three bucket trials each
    expect(await FieldLogEntry.count()).toBe(demoFieldLog().length + demoSiteTestCount());
    expect(await FieldLogTrial.count()).toBe(
      demoFieldLog().reduce((n, e) => n + e.trials.length, 0) + 3 * demoSiteTestCount(),
    );
    const { Site, SiteVersion } = initModels(sequelize);
    expect(await Site.count()).toBe(demoSites.length);
    expect(await SiteVersion.count()).toBe(demoSites.reduce((n, s) => n + s.versions.length, 0));
    expect(await FieldLogLink.count()).toBe(1);
    const q = await Question.findOne({ where: { title: demoQuestions[0].title }, include: ['author', 'tags'] });
    expect(q?.author?.handle).toBe(demoQuestions[0].author);
    expect(q?.tags?.map((t) => t.slug).sort()).toEqual([...demoQuestions[0].tags].sort());

    const reverted = await migrator.down({ to: 0 });
    expect(reverted.length).toBe(migrations.length);
    expect(await tableNames()).toEqual(['schema_migrations']);

    await migrator.up();
    expect(await migrator.pending()).toEqual([]);
    expect(await Question.count()).toBe(0);
  });
});
