import { availableParallelism } from 'node:os';
import { Worker, UnrecoverableError, type Job } from 'bullmq';
import { Piscina } from 'piscina';
import pino from 'pino';
import { loadConfig } from '../config.ts';
import { openDatabase } from '../db/database.ts';
import { failRun, finishRun, processChunk, type ChunkDeps } from './chunk-worker.ts';
import { CHUNK_ATTEMPTS, FLEET_QUEUE, fleetConnection, openFleetQueue, type ChunkJob, type FinishJob } from './fleet-queue.ts';
import { requeueLost } from './requeue.ts';

// `npm run worker`: takes study chunks from the queue at REDIS_URL and runs them on a thread per
// core, writing into the same database as the server (RIDEWRIGHT_DB or DATABASE_URL). Start as
// many as you like, on as many machines as reach the Redis and the database.
const redisUrl = process.env.REDIS_URL;
if (!redisUrl) {
  console.error('REDIS_URL is not set: the worker needs the Redis the server queues studies on (README, "Running for a team").');
  process.exit(1);
}
const config = loadConfig(process.env);
const logger = pino({ level: process.env.LOG_LEVEL ?? 'info' });
const positive = (v: string | undefined, fallback: number) => (Number(v) > 0 ? Number(v) : fallback);
const threads = positive(process.env.FLEET_THREADS, availableParallelism());
// How long a chunk stays with a worker that stopped answering before another takes it.
const lockMs = positive(process.env.FLEET_LOCK_MS, 30_000);
const checkMs = positive(process.env.FLEET_CHECK_MS, 5_000);
const logChunks = process.env.FLEET_LOG_CHUNKS === '1';

const db = openDatabase(config.database);
const queue = openFleetQueue(redisUrl, (err) => logger.warn({ err: err.message }, 'queue connection'));
const pool = new Piscina({ filename: new URL('./chunk-thread.mjs', import.meta.url).href, minThreads: threads, maxThreads: threads, idleTimeout: 60_000 });
const deps: ChunkDeps = { db, queue, pool, now: () => new Date() };

const worker = new Worker(
  FLEET_QUEUE,
  async (job: Job) => {
    if (job.name === 'finish') return finishRun(deps, job.data as FinishJob);
    // one line per chunk taken, for the fault tests and for watching a worker by eye
    if (logChunks) console.log(`took chunk ${job.id}`);
    const started = performance.now();
    const done = await processChunk(deps, job.data as ChunkJob);
    if (logChunks) console.log(`chunk ${job.id} ${done.outcome}: ${(performance.now() - started).toFixed(1)} ms in the worker, ${done.threadMs.toFixed(1)} ms of runs`);
    return done;
  },
  { connection: fleetConnection(redisUrl), concurrency: threads, lockDuration: lockMs, stalledInterval: lockMs, maxStalledCount: 3 },
);
worker.on('failed', (job, err) => {
  if (!job) return;
  const final = err instanceof UnrecoverableError || err.name === 'UnrecoverableError' || job.attemptsMade >= (job.opts.attempts ?? CHUNK_ATTEMPTS) || /stalled/i.test(err.message);
  logger.warn({ job: job.id, attempt: job.attemptsMade, final, err: err.message }, 'chunk failed');
  if (final) failRun(deps, job.data as ChunkJob | FinishJob, err.message).catch((e: unknown) => logger.error({ err: e }, 'could not mark the study failed'));
});
// Redis going away is reported here and retried by the client; it must not end the process.
worker.on('error', (err) => logger.warn({ err: err.message }, 'queue connection'));

const check = setInterval(() => {
  requeueLost(db, queue)
    .then((n) => n > 0 && logger.info({ chunks: n }, 'queued again what Redis had lost'))
    .catch((err: unknown) => logger.warn({ err: (err as Error).message }, 'could not check the queue'));
}, checkMs);

await worker.waitUntilReady();
console.log(`worker ready: ${threads} threads on ${FLEET_QUEUE}`);

let stopping = false;
async function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info(`${signal}: finishing the chunks in hand`);
  clearInterval(check);
  // with Redis gone the close cannot complete; a chunk left unfinished is given to another worker
  setTimeout(() => process.exit(1), 15_000).unref();
  await worker.close();
  await queue.close();
  await pool.destroy();
  await db.destroy();
  process.exit(0);
}
process.on('SIGTERM', () => void stop('SIGTERM'));
process.on('SIGINT', () => void stop('SIGINT'));
