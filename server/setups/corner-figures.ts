import { LRUCache } from 'lru-cache';
import type { ModalResult } from '../../shared/schemas/modal.ts';
import type { CornerFigures } from '../../shared/schemas/setup-record.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { equivalentDampingLeastSquares } from '../../shared/sim/damper-equivalent.ts';
import { modalAnalysis } from '../../shared/sim/linear/modal.ts';
import { linearCorner } from '../../shared/sim/quarter-car.ts';

/**
 * Linear analysis of a stored setup document with the simulation core's own reduction
 * (`linearCorner`: wheel rate with the gas rate, damper as its least-squares equivalent), so
 * the figures here are the ones a run reports.
 *
 * `modal` is null when the analysis cannot resolve the corner. The schema allows corners far
 * outside any car (found by tests/fuzz): a first damper point at 5e-324 m/s makes the equivalent
 * damping infinite, and 1e8 N·s/m against a 36 kg wheel leaves the eigenvalue solver a root of
 * the wrong sign. One such setup must not take a list or a page down with it.
 */
export function analyseSetup(setup: Setup): { modal: ModalResult | null; wheelRate: number } {
  const equivalent = equivalentDampingLeastSquares(setup.damper);
  const corner = linearCorner(setup, equivalent);
  let modal: ModalResult | null;
  try {
    modal = modalAnalysis(corner, equivalent.definition);
  } catch {
    modal = null;
  }
  const modes = modal ? [modal.body.naturalHz, modal.body.dampingRatio, modal.wheel.naturalHz, modal.wheel.dampingRatio] : [];
  return { modal: modal && modes.every(Number.isFinite) ? modal : null, wheelRate: corner.wheelRate };
}

/** The list's figures of a corner; null when its analysis has none (see `analyseSetup`). */
export function figuresOf(setup: Setup): CornerFigures | null {
  const { modal, wheelRate } = analyseSetup(setup);
  return modal && { bodyHz: modal.body.naturalHz, wheelHopHz: modal.wheel.naturalHz, bodyDampingRatio: modal.body.dampingRatio, wheelRate };
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
    known = { figures: figuresOf(parseStoredSetup(documentJson, `of revision ${revisionId}`)) };
    figuresByRevision.set(revisionId, known);
  }
  return known.figures;
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
