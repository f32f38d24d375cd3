/**
 * `npm run seed`: seeds the invented demo organisations into the project-local database. It
 * refuses an external DATABASE_URL unless asked explicitly (`npm run seed -- --external`), so
 * demo users with a published password never land in a real database by accident.
 */
import { db } from '../db';
import { seedDemo } from '../demo/seed';

async function main() {
  if (process.env.DATABASE_URL && !process.argv.includes('--external')) {
    console.log('› seed: DATABASE_URL points at an external server; not seeding demo data (pass --external to do it anyway)');
    return;
  }
  const { created } = await seedDemo();
  console.log(created.length === 0 ? '› seed: demo data already present' : `› seed: created ${created.join(', ')}`);
}

main()
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => db.destroy());
