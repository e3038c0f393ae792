import { randomUUID } from 'node:crypto';
import { Setup } from '../../shared/schemas/setup.ts';
import type { StudyDefinition } from '../../shared/schemas/study.ts';
import type { PublicStudy, StudyDetail } from '../../shared/schemas/study-record.ts';
import { findStudy, findStudyById, insertStudy, listStudyPoints, upsertStudyPoints, withStudyBytes, definitionOf, detailOf, studyRoadsOf } from '../studies/index.ts';
import { readStored } from '../core/stored-json.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok } from '../core/outcome.ts';
import { insertNewSetupInTx } from '../setups/index.ts';
import type { ShareableKind } from './shareable-kind.ts';

const gone = () => fail('gone', 'What this link pointed to is no longer there.');

/** What a link shows of a study: its figures, no internal ids (roads written out, people by name). */
export function publicStudyOf(detail: StudyDetail): PublicStudy {
  const { id: _id, base, createdBy, definition, results, baseline, ...rest } = detail;
  const { base: _base, roads, ...def } = definition;
  return {
    ...rest,
    base: { setupName: base.setupName, revisionNumber: base.revisionNumber },
    createdBy: { name: createdBy.name },
    definition: {
      ...def,
      roads: roads.map((entry, i) => ({ source: 'inline' as const, road: detail.roads[i], ...(entry.name ? { name: entry.name } : {}), ...(entry.seed !== undefined ? { seed: entry.seed } : {}) })),
    },
    results: results && { ...results, ranBy: { name: results.ranBy.name } },
    baseline: baseline && { ...baseline, chosenBy: { name: baseline.chosenBy.name } },
  };
}

/**
 * A study behind a read-only link. Copying takes the study with its saved results into the
 * caller's workspace, with the base setup it needs: that revision's document becomes a new
 * setup there, and library roads travel as written-out roads (the other workspace has no such
 * library entries), so the copy runs the same and gives the same results.
 */
export const studyShare: ShareableKind = {
  async describe(db, workspaceId, objectId) {
    const row = await findStudyById(db, objectId);
    if (!row || row.workspace_id !== workspaceId) return undefined;
    return { label: `Study "${row.name}"`, setupId: null, revisionNumber: null };
  },

  async view(db, link) {
    const row = await findStudy(db, link.workspace_id, link.object_id);
    if (!row) return undefined;
    return {
      readOnly: true,
      objectType: 'study',
      workspaceName: link.workspace_name,
      sharedBy: link.created_by_name,
      sharedAt: link.created_at,
      expiresAt: link.expires_at,
      study: publicStudyOf(await detailOf(db, row)),
    };
  },

  async copy(trx, link, workspaceId, actor, now) {
    const row = await findStudy(trx, link.workspace_id, link.object_id);
    if (!row) return gone();
    const def = definitionOf(row);
    const document = readStored(Setup, row.base_document, 'study base setup');
    const setup = await insertNewSetupInTx(
      trx,
      { workspaceId },
      actor,
      { document, message: `Base of study "${row.name}" (revision ${row.base_revision_number}), copied from ${link.workspace_name}` },
      { source: `copy:${link.id}`, action: 'setup.copied', verb: 'copied in, from a shared study,' },
      now,
    );
    if (!setup.ok) return setup;
    const roads = await studyRoadsOf(trx, row, def);
    const copied: StudyDefinition = {
      ...def,
      base: { setupId: setup.value.id, revisionId: setup.value.revision.id },
      roads: def.roads.map((entry, i) => ({ source: 'inline' as const, road: roads[i], ...(entry.name ? { name: entry.name } : {}), ...(entry.seed !== undefined ? { seed: entry.seed } : {}) })),
    };
    const id = randomUUID();
    const at = now.toISOString();
    await insertStudy(trx, withStudyBytes({
      id,
      workspace_id: workspaceId,
      name: row.name,
      definition: JSON.stringify(copied),
      base_setup_id: setup.value.id,
      base_revision_id: setup.value.revision.id,
      base_revision_number: 1,
      base_document: row.base_document,
      roads: '[]',
      road_refs: JSON.stringify(copied.roads.map(() => null)),
      planned_points: row.planned_points,
      planned_runs: row.planned_runs,
      status: row.status,
      results: row.results,
      baseline_point_index: null,
      chosen_by: null,
      chosen_at: null,
      created_by: actor.id,
      created_at: at,
      updated_at: at,
    }));
    const points = await listStudyPoints(trx, row.id);
    await upsertStudyPoints(trx, points.map((p) => ({ ...p, study_id: id })));
    await recordAudit(trx, {
      workspaceId,
      actorId: actor.id,
      action: 'study.copied',
      entityType: 'study',
      entityId: id,
      summary: `${actor.name} copied study "${row.name}" in from a link shared by ${link.created_by_name} of ${link.workspace_name}, with ${points.filter((p) => p.idx >= 0).length} saved points.`,
      at: now,
    });
    return ok({ id, name: row.name });
  },
};
