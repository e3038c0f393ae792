/** One counted action (see migrations/0008_throttle_events.ts). `at` is an ISO timestamp. */
export interface ThrottleEventTable {
  key: string;
  at: string;
}
