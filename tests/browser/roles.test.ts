import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/workspace.ts';
import { apiWrite, demoUser, launchBrowser, newSession, screenshot, signIn, TABLET } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Signs in as the demo user with `role` and opens the Team page of the demo workspace. */
async function openTeamAs(role: Role, viewport?: { width: number; height: number }) {
  const user = await demoUser(baseUrl, role);
  const session = await newSession(browser, baseUrl, viewport);
  await signIn(session.page, user.email);
  const workspaceId = new URL(session.page.url()).pathname.split('/')[2];
  expect(session.page.url()).toMatch(/\/w\/[^/]+$/);
  await session.page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Team' }).click();
  await session.page.waitForURL(`**/w/${workspaceId}/team`);
  await session.page.getByRole('table', { name: 'Members of this workspace' }).waitFor();
  // other test files add members to the same workspace, so count them rather than assume four
  const members = await session.page.request.get(`/api/workspaces/${workspaceId}/members`);
  const memberCount: number = (await members.json()).members.length;
  expect(memberCount).toBeGreaterThanOrEqual(4);
  return { ...session, user, workspaceId, memberCount };
}

describe('what each demo role sees and may do', () => {
  it('admin: invite form, a role picker per member, remove buttons and the activity log', async () => {
    const { page, context, workspaceId, memberCount } = await openTeamAs('admin');
    expect(await page.getByText(/Your role:\s*admin/).count()).toBe(1);
    expect(await page.getByRole('form', { name: 'Invite a member' }).isVisible()).toBe(true);
    expect(await page.getByRole('combobox', { name: /^Role of / }).count()).toBe(memberCount);
    expect(await page.getByRole('button', { name: /^Remove / }).count()).toBe(memberCount);
    expect(await page.getByRole('note', { name: 'Read-only' }).count()).toBe(0);
    await screenshot(page, 'team-admin-1280');

    const activity = page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Activity' });
    await activity.click();
    await page.waitForURL(`**/w/${workspaceId}/activity`);
    await page.getByRole('table', { name: /Changes made in this workspace/ }).waitFor();
    expect(await page.getByRole('cell', { name: /seeded/i }).count()).toBeGreaterThan(0);
    await screenshot(page, 'activity-admin-1280');
    await context.close();
  });

  it.each(['lead', 'engineer'] as const)('%s: sees the team read-only and the server refuses an invitation', async (role) => {
    const session = await openTeamAs(role);
    const { page, context, workspaceId, memberCount } = session;
    expect(await page.getByRole('form', { name: 'Invite a member' }).count()).toBe(0);
    expect(await page.getByRole('combobox', { name: /^Role of / }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Remove / }).count()).toBe(0);
    expect(await page.getByRole('row').count()).toBe(memberCount + 1); // header + members, each role as plain text
    // the activity log is for admins: no entry in the rail
    expect(await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Activity' }).count()).toBe(0);
    // not a viewer, so no read-only note
    expect(await page.getByRole('note', { name: 'Read-only' }).count()).toBe(0);

    const response = await apiWrite(session, 'POST', `/api/workspaces/${workspaceId}/invitations`, { email: `someone.${role}@tallisbrume.example`, role: 'viewer' });
    expect(response.status()).toBe(403);
    expect((await response.json()).error.code).toBe('forbidden');
    await context.close();
  });

  it('viewer: read-only note once, no edit controls, and every write is refused', async () => {
    const session = await openTeamAs('viewer');
    const { page, context, workspaceId } = session;
    const note = page.getByRole('note', { name: 'Read-only' });
    expect(await note.count()).toBe(1);
    expect(await note.textContent()).toMatch(/read everything/i);
    expect(await page.getByRole('form', { name: 'Invite a member' }).count()).toBe(0);
    expect(await page.getByRole('combobox', { name: /^Role of / }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Remove / }).count()).toBe(0);
    await screenshot(page, 'team-viewer-1280');

    const invite = await apiWrite(session, 'POST', `/api/workspaces/${workspaceId}/invitations`, { email: 'from.viewer@tallisbrume.example', role: 'admin' });
    expect(invite.status()).toBe(403);
    expect((await invite.json()).error.code).toBe('forbidden');

    const members = await page.request.get(`/api/workspaces/${workspaceId}/members`);
    const self = (await members.json()).members.find((m: { role: string }) => m.role === 'viewer');
    const promote = await apiWrite(session, 'PATCH', `/api/workspaces/${workspaceId}/members/${self.userId}`, { role: 'admin' });
    expect(promote.status()).toBe(403);

    // without the CSRF header the server refuses before it even looks at the role
    const noToken = await page.request.post(`/api/workspaces/${workspaceId}/invitations`, { data: { email: 'x@tallisbrume.example', role: 'viewer' } });
    expect(noToken.status()).toBe(403);
    expect((await noToken.json()).error.code).toBe('csrf');

    // the role really is unchanged
    const after = await page.request.get(`/api/workspaces/${workspaceId}`);
    expect((await after.json()).role).toBe('viewer');
    await context.close();
  });

  it('the workspace home states the role and lists only the sections the role may open (tablet width)', async () => {
    const { page, context, workspaceId, user } = await openTeamAs('engineer', TABLET);
    await page.goto(`/w/${workspaceId}`);
    await page.getByRole('heading', { level: 1, name: 'Overview' }).waitFor();
    expect(await page.getByRole('main').getByText('Tallis & Brume — Chassis').count()).toBeGreaterThan(0);
    expect(await page.getByText(/You are an engineer here/).count()).toBe(1);
    expect(await page.getByRole('complementary').getByText(user.name).count()).toBe(1);
    await screenshot(page, 'home-engineer-820');
    await context.close();
  });
});
