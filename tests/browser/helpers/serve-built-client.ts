import pino from 'pino';
import { loadConfig } from '../../../server/config.ts';
import { startServer } from '../../../server/start-server.ts';

/**
 * The server as `server/main.ts` starts it, but serving the client built into
 * RIDEWRIGHT_TEST_DIST, so a browser-test run never rewrites the shared `dist/`. It stops by
 * itself when the test process that spawned it goes away (its stdin closes).
 */
const distDir = process.env.RIDEWRIGHT_TEST_DIST;
if (!distDir) throw new Error('RIDEWRIGHT_TEST_DIST is not set');

const config = loadConfig(process.env);
const logger = pino({ level: process.env.LOG_LEVEL ?? 'warn' });
const running = await startServer(config, logger, { kind: 'static', distDir });
console.log(`READY ${running.url}`);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  await running.close().catch(() => undefined);
  process.exit(0);
}
process.on('SIGTERM', () => void stop());
process.on('SIGINT', () => void stop());
process.stdin.on('end', () => void stop());
process.stdin.on('error', () => void stop());
process.stdin.resume();
