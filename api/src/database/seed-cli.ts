import dataSource from './data-source.js';
import { seedDemoData } from './seed.js';

async function main(): Promise<void> {
  await dataSource.initialize();
  const loaded = await seedDemoData(dataSource, process.env.SEED_PATH || undefined);
  console.log(loaded ? 'Demo data loaded.' : 'The database already holds data; demo data not loaded.');
  await dataSource.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
