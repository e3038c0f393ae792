import { QueryClient, skipToken } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { latestRevisionsQueryOptions, revisionQueryOptions, revisionsQueryOptions } from './revisions.ts';
import { roadQueryOptions, roadsKey, roadsQueryOptions } from './roads.ts';
import { invalidateAfterSetupWrite, setupQueryOptions, setupsQueryOptions } from './setups.ts';

const ws = 'w1';
const stale = (client: QueryClient, key: readonly unknown[]) => client.getQueryState(key)?.isInvalidated;
/** The key without its data tag, so a test can seed any read with a placeholder. */
const keyOf = (options: { queryKey: readonly unknown[] }): unknown[] => [...options.queryKey];

describe('shared read layer', () => {
  it('gives every feature the same cache entry for the same read', () => {
    expect(keyOf(setupsQueryOptions(ws))).toEqual(setupsQueryOptions(ws, 'exclude').queryKey);
    expect(setupsQueryOptions(ws, 'include').queryKey).not.toEqual(keyOf(setupsQueryOptions(ws)));
    expect(keyOf(latestRevisionsQueryOptions(ws, 's1'))).not.toEqual(latestRevisionsQueryOptions(ws, 's2').queryKey);
  });

  it('a setup write marks every setup and revision read stale and leaves roads alone', async () => {
    const client = new QueryClient();
    const reads = [
      keyOf(setupsQueryOptions(ws)),
      keyOf(setupQueryOptions(ws, 's1')),
      keyOf(latestRevisionsQueryOptions(ws, 's1')),
      keyOf(revisionsQueryOptions(ws, 's1')),
      keyOf(revisionQueryOptions(ws, 's1', 3)),
    ];
    for (const key of [...reads, keyOf(roadsQueryOptions(ws))]) client.setQueryData(key, {});
    await invalidateAfterSetupWrite(client, ws);
    for (const key of reads) expect(stale(client, key)).toBe(true);
    expect(stale(client, keyOf(roadsQueryOptions(ws)))).toBe(false);
  });

  it('a road write by its prefix reaches the list and one road', async () => {
    const client = new QueryClient();
    client.setQueryData(keyOf(roadsQueryOptions(ws)), {});
    client.setQueryData(keyOf(roadQueryOptions(ws, 'r1')), {});
    await client.invalidateQueries({ queryKey: roadsKey(ws) });
    expect(stale(client, keyOf(roadsQueryOptions(ws)))).toBe(true);
    expect(stale(client, keyOf(roadQueryOptions(ws, 'r1')))).toBe(true);
  });

  it('asks for nothing until a form has picked a setup or road', () => {
    expect(latestRevisionsQueryOptions(ws, undefined).queryFn).toBe(skipToken);
    expect(roadQueryOptions(ws, undefined).queryFn).toBe(skipToken);
  });
});
