import dataSource from './data-source';

/** `npm run migrate -w server`: applies pending migrations and exits. */
async function main(): Promise<void> {
  await dataSource.initialize();
  const ran = await dataSource.runMigrations({ transaction: 'each' });
  console.log(ran.length ? `migrations applied: ${ran.map((m) => m.name).join(', ')}` : 'migrations: up to date');
  await dataSource.destroy();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
