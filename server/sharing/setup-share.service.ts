import { fail, ok } from '../core/outcome.ts';
import { analyseSetup, findRevisionById, insertNewSetupInTx, parseStoredSetup } from '../setups/index.ts';
import type { ShareableKind } from './shareable-kind.ts';

/** A setup revision behind a link: shown read-only, copied in as a new setup. */
export const setupRevisionShare: ShareableKind = {
  async describe(db, workspaceId, objectId) {
    const r = await findRevisionById(db, objectId);
    if (!r || r.workspace_id !== workspaceId) return undefined;
    return { label: `${r.setup_name} · revision ${r.number}`, setupId: r.setup_id, revisionNumber: r.number };
  },

  async view(db, link) {
    const r = await findRevisionById(db, link.object_id);
    if (!r || r.workspace_id !== link.workspace_id) return undefined;
    const document = parseStoredSetup(r.document, `of revision ${r.id}`);
    const { modal, wheelRate } = analyseSetup(document);
    return {
      readOnly: true,
      objectType: 'setup_revision',
      workspaceName: link.workspace_name,
      sharedBy: link.created_by_name,
      sharedAt: link.created_at,
      expiresAt: link.expires_at,
      setupName: r.setup_name,
      revision: { number: r.number, message: r.message, createdAt: r.created_at, authorName: r.author_name },
      document,
      modal,
      wheelRate,
    };
  },

  async copy(trx, link, workspaceId, actor, now) {
    const r = await findRevisionById(trx, link.object_id);
    if (!r || r.workspace_id !== link.workspace_id) return fail('gone', 'What this link pointed to is no longer there.');
    const document = parseStoredSetup(r.document, `of revision ${r.id}`);
    const created = await insertNewSetupInTx(
      trx,
      { workspaceId },
      actor,
      { document, message: `Copied from revision ${r.number} shared from ${link.workspace_name}` },
      { source: `copy:${link.id}`, action: 'setup.copied', verb: 'copied in, from a shared link,' },
      now,
    );
    return created.ok ? ok({ id: created.value.id, name: created.value.name }) : created;
  },
};
