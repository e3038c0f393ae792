import { QueryClient, skipToken } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { latestRevisionsQueryOptions, revisionQueryOptions, revisionsQueryOptions } from './revisions.ts';
import { roadQueryOptions, roadsKey, roadsQueryOptions } from './roads.ts';
import { invalidateAfterSetupWrite, setupQueryOptions, setupsQueryOptions } from './setups.ts';

const ws = 'w1';
const stale = (client: QueryClient, key: readonly unknown[]) => client.getQueryState(key)?.isInvalidated;

describe('shared read layer', () => {
  it('gives every feature the same cache entry for the same read', () => {
    expect(setupsQueryOptions(ws).queryKey).toEqual(setupsQueryOptions(ws, 'exclude').queryKey);
    expect(setupsQueryOptions(ws, 'include').queryKey).not.toEqual(setupsQueryOptions(ws).queryKey);
    expect(latestRevisionsQueryOptions(ws, 's1').queryKey).not.toEqual(latestRevisionsQueryOptions(ws, 's2').queryKey);
  });

  it('a setup write marks every setup and revision read stale and leaves roads alone', async () => {
    const client = new QueryClient();
    const reads = [
      setupsQueryOptions(ws).queryKey,
      setupQueryOptions(ws, 's1').queryKey,
      latestRevisionsQueryOptions(ws, 's1').queryKey,
      revisionsQueryOptions(ws, 's1').queryKey,
      revisionQueryOptions(ws, 's1', 3).queryKey,
    ];
    for (const key of [...reads, roadsQueryOptions(ws).queryKey]) client.setQueryData(key, {});
    await invalidateAfterSetupWrite(client, ws);
    for (const key of reads) expect(stale(client, key)).toBe(true);
    expect(stale(client, roadsQueryOptions(ws).queryKey)).toBe(false);
  });

  it('a road write by its prefix reaches the list and one road', async () => {
    const client = new QueryClient();
    client.setQueryData(roadsQueryOptions(ws).queryKey, {});
    client.setQueryData(roadQueryOptions(ws, 'r1').queryKey, {});
    await client.invalidateQueries({ queryKey: roadsKey(ws) });
    expect(stale(client, roadsQueryOptions(ws).queryKey)).toBe(true);
    expect(stale(client, roadQueryOptions(ws, 'r1').queryKey)).toBe(true);
  });

  it('asks for nothing until a form has picked a setup or road', () => {
    const client = new QueryClient();
    expect(client.getQueryCache().build(client, latestRevisionsQueryOptions(ws, undefined)).options.queryFn).toBe(skipToken);
    expect(client.getQueryCache().build(client, roadQueryOptions(ws, undefined)).options.queryFn).toBe(skipToken);
  });
});
