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

const figuresByRevision = new LRUCache<string, { figures: CornerFigures | null }>({ max: 20_000 });

/**
 * The figures of a stored revision, worked out once per revision: revisions never change (a
 * trigger refuses UPDATE), so the setups list does not parse and analyse every document on
 * every request.
 */
export function figuresOfRevision(revisionId: string, documentJson: string): CornerFigures | null {
  let known = figuresByRevision.get(revisionId);
  if (!known) {
    known = { figures: listFigures(parseStoredSetup(documentJson, `of revision ${revisionId}`)) };
    figuresByRevision.set(revisionId, known);
  }
  return known.figures;
}

/**
 * Figures for a list, or null when the linear analysis has none to give: a corner the schema
 * allows can still be far outside what the eigenvalue solver resolves (a damper table whose
 * first point makes a slope of 1e8 N·s/m, found by tests/fuzz). One such setup must not take
 * the whole list down; its row shows dashes.
 */
export function listFigures(setup: Setup): CornerFigures | null {
  try {
    const figures = figuresOf(setup);
    return Object.values(figures).every(Number.isFinite) ? figures : null;
  } catch {
    return null;
  }
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
