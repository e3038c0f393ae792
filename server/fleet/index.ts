// What other parts of the server may use from this domain; everything else stays inside it.
export { openFleetQueue, type FleetQueue } from './fleet-queue.ts';
