import { LRUCache } from 'lru-cache';
import type { ModalResult } from '../../shared/schemas/modal.ts';
import type { CornerFigures } from '../../shared/schemas/setup-record.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { equivalentDampingLeastSquares } from '../../shared/sim/damper.ts';
import { modalAnalysis } from '../../shared/sim/linear/modal.ts';
import { linearCorner } from '../../shared/sim/quarter-car.ts';

/**
 * Linear analysis of a stored setup document with the simulation core's own reduction
 * (`linearCorner`: wheel rate with the gas rate, damper as its least-squares equivalent), so
 * the figures here are the ones a run reports.
 */
export function analyseSetup(setup: Setup): { modal: ModalResult; wheelRate: number } {
  const equivalent = equivalentDampingLeastSquares(setup.damper);
  const corner = linearCorner(setup, equivalent);
  return { modal: modalAnalysis(corner, equivalent.definition), wheelRate: corner.wheelRate };
}

export function figuresOf(setup: Setup): CornerFigures {
  const { modal, wheelRate } = analyseSetup(setup);
  return { bodyHz: modal.body.naturalHz, wheelHopHz: modal.wheel.naturalHz, bodyDampingRatio: modal.body.dampingRatio, wheelRate };
}

const figuresByRevision = new LRUCache<string, CornerFigures>({ max: 20_000 });

/**
 * The figures of a stored revision, worked out once per revision: revisions never change (a
 * trigger refuses UPDATE), so the setups list does not parse and analyse every document on
 * every request.
 */
export function figuresOfRevision(revisionId: string, documentJson: string): CornerFigures {
  let figures = figuresByRevision.get(revisionId);
  if (!figures) {
    figures = figuresOf(parseStoredSetup(documentJson, `of revision ${revisionId}`));
    figuresByRevision.set(revisionId, figures);
  }
  return figures;
}

/**
 * A stored document read back. Documents are validated before they are saved, so a failure
 * here means the database was edited by hand or the schema changed incompatibly: a bug.
 */
export function parseStoredSetup(json: string, where: string): Setup {
  const parsed = Setup.safeParse(JSON.parse(json));
  if (!parsed.success) throw new Error(`stored setup document ${where} no longer matches the schema: ${parsed.error.issues[0]?.message}`);
  return parsed.data;
}
