import type { FleetQueue } from '../../../server/fleet/index.ts';

type Added = Parameters<FleetQueue['addChunks']>[0][number];

/**
 * A queue that keeps what is put on it in memory, for API tests of the routes without Redis
 * (the real queue and workers are tested in tests/fleet/ with real processes).
 */
export function memoryFleetQueue(): FleetQueue & { chunks: Added[] } {
  const chunks: Added[] = [];
  return {
    chunks,
    async addChunks(jobs) {
      chunks.push(...jobs);
    },
    async addFinish() {},
    async removeChunks(jobs) {
      for (const j of jobs) {
        const i = chunks.findIndex((c) => c.studyId === j.studyId && c.generation === j.generation && c.chunk === j.chunk);
        if (i >= 0) chunks.splice(i, 1);
      }
    },
    async pendingCount() {
      return chunks.length;
    },
    async close() {},
  };
}
