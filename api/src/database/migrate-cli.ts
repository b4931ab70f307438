import dataSource from './data-source.js';

/** Runs pending migrations and reports what ran; exits non-zero on failure. */
async function main(): Promise<void> {
  await dataSource.initialize();
  const ran = await dataSource.runMigrations();
  console.log(ran.length ? `Migrations applied: ${ran.map((m) => m.name).join(', ')}` : 'Database schema is up to date.');
  await dataSource.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
