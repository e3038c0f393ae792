import * as Comlink from 'comlink';
import { type DriveFitOutcome, fitDrive } from '../shared/drive/fit-drive.ts';
import type { DriveFitRequestInput } from '../shared/schemas/drive-fit.ts';

/**
 * Comlink shell around `fitDrive` (shared/drive/fit-drive.ts). The fit runs tens of simulations
 * of the whole drive: in the browser's worker it never holds the page, and it costs the shared
 * server nothing while an engineer tries one parameter choice after another.
 */
const api = {
  fit(input: DriveFitRequestInput): DriveFitOutcome {
    return fitDrive(input);
  },
  ping(): 'ready' {
    return 'ready';
  },
};

export type DriveFitApi = typeof api;

Comlink.expose(api);
