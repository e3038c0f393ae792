import type { APIRequestContext } from 'playwright-core';

/** The lists whose every entry has a detail page, with the page's path segment. */
const LISTS = [
  { api: 'setups', key: 'setups', page: 'corners' },
  { api: 'vehicles', key: 'vehicles', page: 'vehicles' },
  { api: 'roads', key: 'roads', page: 'roads' },
  { api: 'runs', key: 'runs', page: 'runs' },
  { api: 'studies', key: 'studies', page: 'studies' },
  { api: 'target-sheets', key: 'sheets', page: 'sheets' },
] as const;

async function getJson(api: APIRequestContext, path: string): Promise<unknown> {
  const response = await api.get(path);
  if (!response.ok()) throw new Error(`GET ${path} answered ${response.status()}`);
  return response.json();
}

/**
 * Every detail page of the signed-in user's first workspace, read from the API (so a page added
 * to the seed is visited without editing a test): each setup, vehicle, road, run, study and sheet.
 */
export async function detailPages(api: APIRequestContext): Promise<string[]> {
  const me = (await getJson(api, '/api/auth/me')) as { memberships: { workspaceId: string }[] };
  const workspaceId = me.memberships[0]?.workspaceId;
  if (!workspaceId) throw new Error('the user has no workspace');
  const base = `/w/${workspaceId}`;
  const paths: string[] = [];
  for (const list of LISTS) {
    const body = (await getJson(api, `/api/workspaces/${workspaceId}/${list.api}`)) as Record<string, { id: string }[]>;
    const items = body[list.key];
    if (!Array.isArray(items)) throw new Error(`/${list.api} has no "${list.key}" list`);
    for (const item of items) paths.push(`${base}/${list.page}/${item.id}`);
  }
  return paths;
}
