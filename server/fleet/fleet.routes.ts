import type { Response } from 'express';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import type { RouteModule } from '../http/registry.ts';
import { withSample, type RunsSample } from './fleet-progress.ts';
import { cancelFleetRun, fleetProgressNow, fleetStatus, startFleetRun } from './fleet.service.ts';

const base = '/api/workspaces/:workspaceId/studies/:studyId/fleet';
/** How often the stream reads the run's counters; the page moves at this pace. */
const STREAM_EVERY_MS = 500;
const KEEP_ALIVE_MS = 15_000;

/**
 * A study on the team's workers: its state (viewer+), start and cancel (engineer+), and a stream
 * of its progress as server-sent events (viewer+). The stream ends by itself once the run is
 * over; closing it changes nothing about the run.
 */
export const fleetRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      res.json(unwrap(await fleetStatus(deps.db, deps.fleet, workspaceOf(req), pathParam(req, 'studyId'), Date.now())));
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    handler: async (req, res) => {
      res.status(202).json(unwrap(await startFleetRun(deps.db, deps.fleet, workspaceOf(req), userOf(req), pathParam(req, 'studyId'), deps.clock())));
    },
  },
  {
    method: 'post',
    path: `${base}/cancel`,
    access: 'engineer',
    handler: async (req, res) => {
      res.json(unwrap(await cancelFleetRun(deps.db, deps.fleet, workspaceOf(req), userOf(req), pathParam(req, 'studyId'), deps.clock())));
    },
  },
  {
    method: 'get',
    path: `${base}/events`,
    access: 'viewer',
    handler: async (req, res) => {
      const studyId = pathParam(req, 'studyId');
      unwrap(await fleetStatus(deps.db, deps.fleet, workspaceOf(req), studyId, Date.now()));
      streamProgress(res, (samples) => fleetProgressNow(deps.db, studyId, Date.now(), samples));
    },
  },
];

function streamProgress(res: Response, read: (samples: RunsSample[]) => ReturnType<typeof fleetProgressNow>): void {
  res.writeHead(200, { 'content-type': 'text/event-stream; charset=utf-8', 'cache-control': 'no-cache, no-transform', connection: 'keep-alive', 'x-accel-buffering': 'no' });
  res.flushHeaders();
  let samples: RunsSample[] = [];
  let sent = '';
  let lastWrite = Date.now();
  let closed = false;
  const stop = () => {
    closed = true;
    clearTimeout(timer);
  };
  res.on('close', stop);
  let timer: NodeJS.Timeout;
  const tick = async () => {
    if (closed) return;
    try {
      const now = Date.now();
      const progress = await read(samples);
      if (progress) samples = withSample(samples, { at: now, runs: progress.runsDone });
      const text = JSON.stringify(progress);
      if (text !== sent) {
        res.write(`event: progress\ndata: ${text}\n\n`);
        sent = text;
        lastWrite = now;
      } else if (now - lastWrite > KEEP_ALIVE_MS) {
        res.write(': still here\n\n');
        lastWrite = now;
      }
      if (!progress || (progress.state !== 'running' && progress.state !== 'finishing')) {
        res.end();
        stop();
        return;
      }
    } catch {
      res.end();
      stop();
      return;
    }
    timer = setTimeout(() => void tick(), STREAM_EVERY_MS);
  };
  void tick();
}
