import type { ErrorCode } from '../errors.ts';
import type { TargetSheetStatus } from '../schemas/target-sheet.ts';
import { hasRole, type Role } from '../schemas/workspace.ts';

/** One allowed move of a sheet, the least role that may make it, and whether it needs a reason. */
export interface SheetTransition {
  from: TargetSheetStatus;
  to: TargetSheetStatus;
  /** Verb for buttons, e-mails and the audit log. */
  action: 'submit' | 'release' | 'return' | 'reopen';
  /** The least role allowed (roles rank viewer < engineer < lead < admin). */
  least: Role;
  reasonRequired: boolean;
}

/** Every allowed transition. Released is final: a change needs a new sheet that supersedes it. */
export const sheetTransitions: readonly SheetTransition[] = [
  { from: 'draft', to: 'in_review', action: 'submit', least: 'engineer', reasonRequired: false },
  { from: 'in_review', to: 'released', action: 'release', least: 'lead', reasonRequired: false },
  { from: 'in_review', to: 'returned', action: 'return', least: 'lead', reasonRequired: true },
  { from: 'returned', to: 'draft', action: 'reopen', least: 'engineer', reasonRequired: false },
];

function find(from: TargetSheetStatus, to: TargetSheetStatus) {
  return sheetTransitions.find((t) => t.from === from && t.to === to);
}

/** True when `role` may move a sheet from `from` to `to` (reasons aside). */
export function canTransition(from: TargetSheetStatus, to: TargetSheetStatus, role: Role): boolean {
  const t = find(from, to);
  return t !== undefined && hasRole(role, t.least);
}

export type TransitionCheck =
  | { ok: true; transition: SheetTransition }
  | { ok: false; code: ErrorCode; message: string };

/**
 * The full check a server makes: the move exists (else `conflict`), the role may make it (else
 * `forbidden`), and a return carries a non-blank reason (else `bad_request`).
 */
export function checkTransition(from: TargetSheetStatus, to: TargetSheetStatus, role: Role, reason?: string): TransitionCheck {
  const t = find(from, to);
  if (!t) {
    const why = from === 'released' ? 'a released sheet is final; draft a new sheet that supersedes it' : `a ${label(from)} sheet cannot become ${label(to)}`;
    return { ok: false, code: 'conflict', message: why };
  }
  if (!hasRole(role, t.least)) return { ok: false, code: 'forbidden', message: `only a ${t.least} or above may ${t.action} a sheet` };
  if (t.reasonRequired && !(reason && reason.trim())) return { ok: false, code: 'bad_request', message: `say why the sheet is sent back` };
  return { ok: true, transition: t };
}

/** The moves `role` may make from `status`, for showing buttons. */
export function allowedTransitions(status: TargetSheetStatus, role: Role): SheetTransition[] {
  return sheetTransitions.filter((t) => t.from === status && hasRole(role, t.least));
}

/** Only drafts change; in review, returned and released sheets are read-only. */
export function isSheetEditable(status: TargetSheetStatus): boolean {
  return status === 'draft';
}

/** A sheet can be superseded once released, and only once. */
export function canSupersede(sheet: { status: TargetSheetStatus; supersededBy: unknown }): boolean {
  return sheet.status === 'released' && !sheet.supersededBy;
}

function label(s: TargetSheetStatus): string {
  return s === 'in_review' ? 'in-review' : s;
}
