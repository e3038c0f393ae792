/**
 * Old path of the damper laws, kept only because server/ still imports from it while the server
 * moves into domain folders. New code imports damper-force.ts, damper-gas.ts,
 * damper-equivalent.ts or damper-compiled.ts; delete this file once server/ does too.
 */
export { tableForce } from './damper-force.ts';
export { equivalentDampingLeastSquares } from './damper-equivalent.ts';
