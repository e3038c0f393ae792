import { Queue, type ConnectionOptions } from 'bullmq';

/**
 * The queue the server fills and `npm run worker` empties (BullMQ on Redis). A job is one chunk
 * of a study's points, or the closing of a study once every point is in. Job ids are derived from
 * the study, its start (generation) and the chunk, so adding a chunk that is already queued or
 * running does nothing: the server and the workers may both re-add what they think is missing.
 */
export const FLEET_QUEUE = 'ridewright-study-chunks';

export interface ChunkJob {
  studyId: string;
  workspaceId: string;
  generation: number;
  chunk: number;
}
export type FinishJob = Omit<ChunkJob, 'chunk'>;

// BullMQ refuses ':' in job ids.
export const chunkJobId = (j: ChunkJob) => `${j.studyId}.g${j.generation}.c${j.chunk}`;
export const finishJobId = (j: FinishJob) => `${j.studyId}.g${j.generation}.finish`;

/** Attempts of a chunk whose error may pass (a busy database); bad input fails at once. */
export const CHUNK_ATTEMPTS = 5;

const jobOptions = { attempts: CHUNK_ATTEMPTS, backoff: { type: 'exponential' as const, delay: 500 }, removeOnComplete: true, removeOnFail: 1000 };

/** Redis at `url`; BullMQ's workers need maxRetriesPerRequest null so a blocking read may wait through a restart. */
export function fleetConnection(url: string): ConnectionOptions {
  return { url, maxRetriesPerRequest: null };
}

export interface FleetQueue {
  addChunks(jobs: ChunkJob[]): Promise<void>;
  addFinish(job: FinishJob): Promise<void>;
  /** Takes queued chunks off the queue (those already running finish, and their writes are refused). */
  removeChunks(jobs: ChunkJob[]): Promise<void>;
  /** Chunks waiting or running, across every study. */
  pendingCount(): Promise<number>;
  close(): Promise<void>;
}

/** `onError`: Redis going away (the client reconnects by itself); without it such errors are ignored. */
export function openFleetQueue(redisUrl: string, onError: (err: Error) => void = () => {}): FleetQueue {
  const queue = new Queue(FLEET_QUEUE, { connection: fleetConnection(redisUrl) });
  queue.on('error', onError);
  return {
    async addChunks(jobs) {
      for (let i = 0; i < jobs.length; i += 500) {
        await queue.addBulk(jobs.slice(i, i + 500).map((data) => ({ name: 'chunk', data, opts: { ...jobOptions, jobId: chunkJobId(data) } })));
      }
    },
    async addFinish(data) {
      await queue.add('finish', data, { ...jobOptions, jobId: finishJobId(data) });
    },
    async removeChunks(jobs) {
      // a running job is locked and stays; its worker finds the run stopped when it writes
      await Promise.all(jobs.map((j) => queue.remove(chunkJobId(j)).catch(() => 0)));
    },
    async pendingCount() {
      const c = await queue.getJobCounts('waiting', 'active', 'delayed', 'prioritized');
      return Object.values(c).reduce((a, b) => a + b, 0);
    },
    close: () => queue.close(),
  };
}
