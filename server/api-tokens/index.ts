// What other parts of the server may use from this domain; everything else stays inside it.
export { apiTokenGate, bearerCaller, bearerOf } from './bearer.ts';
