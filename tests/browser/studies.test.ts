import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RevisionsResponse, SetupDetail, SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { StudiesResponse, StudyDetail } from '../../shared/schemas/study-record.ts';
import { apiWrite, demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';
import { defaultStudyDisplay, savedPointName } from '../../src/features/studies/model/display.ts';

const baseUrl = appUrl();
let browser: Browser;
/** The study the engineer makes, opened by the viewer afterwards. */
let made: { workspaceId: string; studyId: string; name: string } | undefined;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('studies in the browser', () => {
  it('an engineer defines a 2-D study, runs it, sees the front and the best compromise, opens a point on the bench as an unsaved draft, saves it once (a second identical save is refused) and finds the study after a reload', async () => {
    const { page, context } = await newSession(browser, baseUrl);
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    const workspaceId = new URL(page.url()).pathname.split('/')[2];
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Studies' }).click();
    await page.waitForURL(`**/w/${workspaceId}/studies`);
    await page.getByRole('button', { name: 'New study' }).click();

    const form = page.getByRole('form', { name: 'Define a study' });
    const name = `Rebound against spring ${Date.now()}`;
    await form.getByLabel('Study name').fill(name);
    await form.getByLabel('Base setup').selectOption({ label: 'Brume Pipit front, baseline' });
    const first = form.getByRole('group', { name: 'First swept parameter' });
    await first.getByLabel('Parameter').selectOption('reboundScale');
    await first.getByLabel('From').fill('0.7');
    await first.getByLabel('To').fill('1.6');
    await first.getByLabel('Steps').fill('4');
    const second = form.getByRole('group', { name: 'Second swept parameter' });
    await second.getByLabel('Parameter').selectOption('springRate');
    await second.getByLabel('From').fill('24');
    await second.getByLabel('To').fill('40');
    await second.getByLabel('Steps').fill('4');
    await form.getByLabel('Road 1').selectOption('iso:C');
    await form.getByLabel('Speeds [km/h]').fill('72');
    await form.getByLabel('Run length [s]').fill('20');
    await form.getByText('16 points, 17 runs of 20 s').waitFor();
    await screenshot(page, 'study-form-engineer-1280');
    await form.getByRole('button', { name: 'Save and run' }).click();

    await page.waitForURL(new RegExp(`/w/${workspaceId}/studies/[^/?]+`));
    const studyId = new URL(page.url()).pathname.split('/')[4];
    await page.getByRole('progressbar', { name: 'Runs done' }).waitFor();
    const best = page.getByRole('region', { name: 'Best compromise' });
    await best.waitFor({ timeout: 60_000 });
    await page.getByText('Saved: complete results.').waitFor({ timeout: 30_000 });

    // The server judged the saved points the same way: a front through them and the same winner.
    const saved = StudyDetail.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/studies/${studyId}`)).json());
    expect(saved.status).toBe('complete');
    expect(saved.points).toHaveLength(16);
    expect(saved.results?.tradeOff.front.length).toBeGreaterThan(0);
    expect(saved.results?.best).not.toBeNull();
    // the page names the server's winner in the reader's units (default: N/mm); the stored words are SI
    expect(await best.getByTestId('best-compromise-point').textContent()).toBe(savedPointName(defaultStudyDisplay, saved.definition.axes, saved.results!.best!));
    expect(await best.getByText(/^Compared with /).count()).toBeGreaterThan(0);
    const chart = page.getByRole('region', { name: 'Comfort against grip' });
    expect(await chart.getByText('Trade-off front (Pareto)').isVisible()).toBe(true);
    expect(await chart.getByText('Base setup').isVisible()).toBe(true);
    expect(await page.getByRole('table', { name: 'Study points' }).getByRole('row').count()).toBe(1 + 16);
    await screenshot(page, 'study-engineer-1280');

    // The best point opens on the corner bench as an unsaved draft: nothing is stored until the engineer saves.
    const setupUrl = `/api/workspaces/${workspaceId}/setups/${saved.base.setupId}`;
    const before = SetupDetail.parse(await (await page.request.get(setupUrl)).json());
    const studyPage = page.url();
    const openDraft = async () => {
      await page.goto(studyPage);
      await page.getByRole('region', { name: 'Best compromise' }).getByRole('link', { name: 'Open as setup draft' }).click();
      await page.waitForURL(new RegExp(`/w/${workspaceId}/corners/${saved.base.setupId}\\?study=${studyId}&point=\\d+`));
      await page.getByText('A study point, not saved yet').waitFor();
    };
    await openDraft();
    const bar = page.getByRole('form', { name: 'Save as a new revision' });
    await bar.getByText(`Unsaved changes to revision ${before.latestRevision}`).waitFor();
    const message = await bar.getByLabel('What changed').inputValue();
    expect(message).toMatch(new RegExp(`^From study "${name}", point \\d+: ${saved.results?.best?.label.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
    expect(SetupDetail.parse(await (await page.request.get(setupUrl)).json()).latestRevision).toBe(before.latestRevision);
    await screenshot(page, 'bench-study-draft-1280');
    await page.setViewportSize({ width: 1440, height: 900 });
    await screenshot(page, 'bench-study-draft-1440');
    await page.setViewportSize({ width: 1280, height: 800 });
    await bar.getByRole('button', { name: `Save my edits as revision ${before.latestRevision + 1}` }).click();
    await page.getByText(`Saved as revision ${before.latestRevision + 1}.`).waitFor();
    const after = SetupDetail.parse(await (await page.request.get(setupUrl)).json());
    expect(after.latestRevision).toBe(before.latestRevision + 1);
    expect(after.revision.message).toBe(message);
    expect(new URL(page.url()).search).toBe('');

    // The same point again while it is the latest revision: nothing to save, and the page says so.
    await openDraft();
    await page.getByText(`Revision ${after.latestRevision}, the latest, already holds exactly this point`).waitFor();
    expect(await bar.getByRole('button', { name: `Save my edits as revision ${after.latestRevision + 1}` }).isDisabled()).toBe(true);

    // Someone saves another change; the same point opened once more is refused on save, with a link to the revision that holds it.
    const tweak = { setup: { ...after.revision.document, springRate: after.revision.document.springRate + 1000 }, message: 'Spring +1 N/mm', basedOn: after.latestRevision };
    expect((await apiWrite({ page, context }, 'POST', `${setupUrl}/revisions`, tweak)).status()).toBe(201);
    await openDraft();
    await bar.getByRole('button', { name: `Save my edits as revision ${after.latestRevision + 2}` }).click();
    const refusal = bar.getByRole('alert').filter({ hasText: `revision ${after.latestRevision} already holds exactly these values` });
    await refusal.waitFor();
    await screenshot(page, 'bench-study-duplicate-1280');
    await refusal.getByRole('link', { name: `See revision ${after.latestRevision}` }).click();
    expect(new URL(page.url()).hash).toBe(`#revision-${after.latestRevision}`);
    expect(SetupDetail.parse(await (await page.request.get(setupUrl)).json()).latestRevision).toBe(after.latestRevision + 1);
    await page.goto(studyPage);

    await page.reload();
    await page.getByRole('region', { name: 'Best compromise' }).waitFor();
    await page.getByRole('link', { name: 'Studies', exact: true }).first().click();
    await page.waitForURL(`**/w/${workspaceId}/studies`);
    const row = page.getByRole('table', { name: 'Studies' }).getByRole('row', { name: new RegExp(name) });
    await row.waitFor();
    expect(await row.getByText('complete').count()).toBe(1);
    await screenshot(page, 'studies-list-engineer-1280');
    made = { workspaceId, studyId, name };
    await context.close();
  });

  it('a viewer opens the study and can only preview a run: saving is refused and nothing changes', async () => {
    if (!made) throw new Error('the engineer test must run first');
    const { page, context } = await newSession(browser, baseUrl);
    await signIn(page, (await demoUser(baseUrl, 'viewer')).email);
    await page.goto(`/w/${made.workspaceId}/studies/${made.studyId}`);
    await page.getByRole('heading', { name: made.name }).waitFor();
    await page.getByRole('region', { name: 'Best compromise' }).waitFor();
    expect(await page.getByRole('button', { name: /Run and save|Run again and save/ }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'Open as setup draft' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Mark as baseline' }).count()).toBe(0);

    const preview = page.getByRole('button', { name: 'Preview a run (not saved)' });
    await preview.click();
    await page.getByText('Preview only: nothing was saved.').waitFor({ timeout: 60_000 });
    await screenshot(page, 'study-viewer-1280');

    // The server refuses a viewer's save, whatever the page offers.
    const refused = await apiWrite({ page, context }, 'POST', `/api/workspaces/${made.workspaceId}/studies/${made.studyId}/points`, { points: [] });
    expect(refused.status()).toBe(403);
    const list = StudiesResponse.parse(await (await page.request.get(`/api/workspaces/${made.workspaceId}/studies`)).json());
    const mine = list.studies.find((s) => s.id === made!.studyId);
    expect(mine?.results?.ranBy.name).not.toBe((await demoUser(baseUrl, 'viewer')).name);
    await context.close();
  });

  it('a lead marks the best compromise as the team’s baseline; the list shows it', async () => {
    if (!made) throw new Error('the engineer test must run first');
    const { page, context } = await newSession(browser, baseUrl);
    await signIn(page, (await demoUser(baseUrl, 'lead')).email);
    await page.goto(`/w/${made.workspaceId}/studies/${made.studyId}`);
    const best = page.getByRole('region', { name: 'Best compromise' });
    await best.waitFor();
    const label = await best.getByTestId('best-compromise-point').textContent();
    await best.getByRole('button', { name: 'Mark as baseline' }).click();
    await page.getByText(`baseline: ${label}`).waitFor();
    await best.getByRole('button', { name: 'Clear the baseline' }).waitFor();
    const saved = StudyDetail.parse(await (await page.request.get(`/api/workspaces/${made.workspaceId}/studies/${made.studyId}`)).json());
    expect(saved.baseline).toMatchObject({ label: saved.results?.best?.label, pointIndex: saved.results?.best?.pointIndex });
    await page.goto(`/w/${made.workspaceId}/studies`);
    const row = page.getByRole('table', { name: 'Studies' }).getByRole('row', { name: new RegExp(made.name) });
    await row.getByText('baseline picked').waitFor();
    await context.close();
  });

  it('stopping a long run keeps and saves the finished points as a partial result', async () => {
    const session = await newSession(browser, baseUrl);
    const { page, context } = session;
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    const workspaceId = new URL(page.url()).pathname.split('/')[2];
    const setups = SetupsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/setups`)).json());
    const pipit = setups.setups.find((x) => x.name === 'Brume Pipit front, baseline')!;
    const revisions = RevisionsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${pipit.id}/revisions`)).json());
    const definition = {
      name: `Long sweep to stop ${Date.now()}`,
      base: { setupId: pipit.id, revisionId: revisions.revisions[0].id },
      axes: [
        { parameter: 'damperScale', from: 0.5, to: 2, steps: 20 },
        { parameter: 'springRate', from: 20000, to: 44000, steps: 20 },
      ],
      roads: [{ source: 'inline', road: { kind: 'iso8608', name: 'ISO class C', class: 'C', seed: 7 } }],
      speeds: [20],
      duration: 60,
      objectives: [
        { figure: 'bodyAccelWkRms', weight: 1 },
        { figure: 'tyreLoadRatio', weight: 1 },
      ],
    };
    const created = await apiWrite(session, 'POST', `/api/workspaces/${workspaceId}/studies`, { definition });
    expect(created.status()).toBe(201);
    const studyId = StudyDetail.parse(await created.json()).id;

    await page.goto(`/w/${workspaceId}/studies/${studyId}`);
    await page.getByRole('button', { name: 'Run and save' }).click();
    const bar = page.getByRole('progressbar', { name: 'Runs done' });
    await bar.waitFor();
    await page.waitForFunction(() => Number(document.querySelector('[role=progressbar]')?.getAttribute('aria-valuenow')) >= 30, undefined, { timeout: 60_000 });
    await page.getByRole('button', { name: 'Stop the run' }).click();
    await page.getByText('Saved: partial results.').waitFor({ timeout: 30_000 });
    expect(await page.getByText(/^Stopped after \d+ of the points/).count()).toBe(1);
    await screenshot(page, 'study-stopped-engineer-1280');

    const saved = StudyDetail.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/studies/${studyId}`)).json());
    expect(saved.status).toBe('partial');
    expect(saved.points.length).toBeGreaterThan(0);
    expect(saved.points.length).toBeLessThan(400);
    expect(saved.results?.savedPoints).toBe(saved.points.length);
    // only whole points are kept: each with its one run (one road, one speed)
    expect(saved.points.every((p) => p.runs.length === 1)).toBe(true);
    await context.close();
  });
});

