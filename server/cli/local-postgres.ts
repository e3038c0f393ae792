import { adminQuery, startLocalPostgres } from '../db/local-postgres.ts';

// `npm run db:postgres [-- --port 55432 --dir data/postgres]`: a PostgreSQL server from Debian's
// `postgresql` package for trying the team setup on one machine. It keeps its data in `--dir`,
// listens on 127.0.0.1 only, trusts the local user `ridewright`, makes the database `ridewright`
// on first start, prints the DATABASE_URL to use, and runs until Ctrl-C. A real team runs the
// PostgreSQL its operations people already run; this is not that.
const args = process.argv.slice(2);
const option = (name: string, fallback: string) => {
  const at = args.indexOf(name);
  return at >= 0 && args[at + 1] ? args[at + 1] : fallback;
};
const port = Number(option('--port', '55432'));
const dataDir = option('--dir', 'data/postgres');
const cluster = await startLocalPostgres({ dataDir, port });
try {
  await adminQuery(cluster.url(), 'create database ridewright');
} catch (err) {
  if (!/already exists/.test(String(err))) throw err;
}
console.log(`PostgreSQL ${cluster.binDir} serving ${dataDir} on 127.0.0.1:${port}`);
console.log(`DATABASE_URL=${cluster.url('ridewright')}`);
console.log('Ctrl-C stops it.');
const stop = () => void cluster.stop().then(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
setInterval(() => undefined, 1 << 30);
