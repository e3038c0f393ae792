import pino from 'pino';
import { loadConfig } from './config.ts';
import { startServer } from './start-server.ts';

// `npm start` / `npm run dev:server`: serve API and built client from one process.
const config = loadConfig(process.env);
const logger = pino({ level: process.env.LOG_LEVEL ?? (config.nodeEnv === 'test' ? 'warn' : 'info') });

let running: Awaited<ReturnType<typeof startServer>>;
try {
  running = await startServer(config, logger);
} catch (err) {
  logger.fatal({ err }, 'could not start');
  process.exit(1);
}

console.log(`Ridewright is serving ${running.url}${config.demoMode ? ' (demo mode)' : ''}`);
if (running.sinkPort !== undefined) console.log(`mail goes to the local sink on 127.0.0.1:${running.sinkPort} (see the outbox page)`);

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info(`${signal}: shutting down`);
  try {
    await running.close();
    process.exit(0);
  } catch (err) {
    logger.error({ err }, 'unclean shutdown');
    process.exit(1);
  }
}
process.on('SIGTERM', () => void stop('SIGTERM'));
process.on('SIGINT', () => void stop('SIGINT'));
