import { inject } from 'vitest';

/**
 * The address of the app this test file talks to: global-setup.ts starts one app per vitest
 * worker, each on its own copy of the seeded database, and a file uses its worker's app
 * (VITEST_POOL_ID runs from 1 to maxWorkers), so two files running at once never share data.
 */
export function appUrl(): string {
  const urls = inject('baseUrls');
  const slot = Number(process.env.VITEST_POOL_ID ?? '1');
  return urls[(slot - 1) % urls.length]!;
}
