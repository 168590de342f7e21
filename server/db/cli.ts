import fs from 'node:fs';
import path from 'node:path';
import { loadConfig } from '../config/env';
import { createFileStorage } from '../services/file-storage';
import { backupShop, restoreShop, type Shop } from './backup';
import { openDataSource } from './data-source';
import { seedDemoHistory } from './demo-history';
import { seedDemoWeek } from './demo-week';
import { demoSignInLines, seedDemoShop } from './seed';

async function generate(name: string | undefined): Promise<void> {
  if (!name || !/^[a-z][a-z0-9-]*$/.test(name)) throw new Error('Usage: npm run db:migration:generate -- <kebab-case-name>');
  const dataSource = await openDataSource(loadConfig().database, { migrate: true });
  const sql = await dataSource.driver.createSchemaBuilder().log();
  await dataSource.destroy();
  if (sql.upQueries.length === 0) return console.log('The entities match the migrations; nothing to generate.');
  const stamp = Date.now();
  const className = name.replace(/(^|-)(\w)/g, (_m, _d, c: string) => c.toUpperCase()) + stamp;
  const lines = (qs: { query: string }[]) => qs.map((q) => `    await queryRunner.query(${JSON.stringify(q.query)});`).join('\n');
  const file = path.join('server/db/migrations', `${stamp}-${name}.ts`);
  fs.writeFileSync(
    file,
    `import type { MigrationInterface, QueryRunner } from 'typeorm';\n\n// Generated for ${dataSource.options.type}; check it also suits the other database before committing.\nexport class ${className} implements MigrationInterface {\n  name = '${className}';\n\n  async up(queryRunner: QueryRunner): Promise<void> {\n${lines(sql.upQueries)}\n  }\n\n  async down(queryRunner: QueryRunner): Promise<void> {\n${lines(sql.downQueries.reverse())}\n  }\n}\n`,
  );
  console.log(`Wrote ${file}; add ${className} to server/db/migrations.ts.`);
}

function shop(): Shop {
  const config = loadConfig();
  if (config.database.kind !== 'sqlite') {
    throw new Error('Backups here are for the SQLite file. On PostgreSQL use pg_dump and pg_restore, and copy the upload folder or bucket with them.');
  }
  return { databasePath: config.database.path, storage: createFileStorage(config) };
}

async function backup(): Promise<void> {
  const { databasePath, storage } = shop();
  const result = await backupShop({ databasePath, storage }, path.join(path.dirname(path.resolve(databasePath)), 'backups'));
  console.log(`Backed up the database and ${result.files} uploaded file(s) to ${result.folder} (readable by this user only).`);
  if (result.missing.length) console.warn(`These recorded files were missing from the file storage and are not in the backup: ${result.missing.join(', ')}`);
}

async function restore(backupPath: string | undefined): Promise<void> {
  if (!backupPath) throw new Error('Usage: npm run restore -- <backup folder>   (stop the server first)');
  const target = shop();
  const { files, withFiles } = await restoreShop(backupPath, target);
  const what = withFiles ? `the database and ${files} uploaded file(s)` : 'the database (this older backup holds no uploaded files)';
  console.log(`Restored ${what} from ${backupPath} to ${target.databasePath}. Start the server again.`);
}

async function run(command: string | undefined, arg: string | undefined): Promise<void> {
  const config = loadConfig();
  if (command === 'generate') return generate(arg);
  if (command === 'backup') return backup();
  if (command === 'restore') return restore(arg);
  const dataSource = await openDataSource(config.database, { migrate: true });
  try {
    if (command === 'migrate') {
      console.log('Migrations are up to date.');
    } else if (command === 'seed') {
      const { seeded } = await seedDemoShop(dataSource, { uploadDir: config.uploadDir, storage: createFileStorage(config) });
      if (seeded) await seedDemoHistory(dataSource);
      // `seed --quiet-week` books nothing this week or next, neither the days ahead nor this week's days gone by (a database for tests that book them).
      if (seeded && arg !== '--quiet-week') console.log(`Booked ${(await seedDemoWeek(dataSource)).sessions} spray sessions this week and next (the days gone by already sprayed).`);
      console.log(seeded ? `Seeded the demo shop. Sign-ins:\n${demoSignInLines().join('\n')}` : 'The database already has users; the demo shop was not seeded.');
    } else {
      throw new Error(`Unknown command "${command}": use migrate, seed or generate`);
    }
  } finally {
    await dataSource.destroy();
  }
}

run(process.argv[2], process.argv[3]).catch((error: Error) => {
  console.error(error.message);
  process.exit(1);
});
