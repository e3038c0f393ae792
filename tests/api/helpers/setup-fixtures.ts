import type { Setup, SetupInput } from '../../../shared/schemas/setup.ts';
import { Setup as SetupSchema } from '../../../shared/schemas/setup.ts';
import type { SetupDetail } from '../../../shared/schemas/setup-record.ts';
import type { Db } from '../../../server/db/database.ts';
import { createLink } from '../../../server/sharing/share-links.service.ts';
import { createSetup } from '../../../server/setups/setups.service.ts';
import type { TestUser } from './people.ts';

/** An invented small-hatchback front corner (SI units), valid against the setup schema. */
export function cornerDocument(name = 'Test front corner', overrides: Partial<SetupInput> = {}): SetupInput {
  return {
    name,
    sprungMass: 310,
    unsprungMass: 38,
    springRate: 32000,
    motionRatio: 0.95,
    tyreRate: 210000,
    tyreDamping: 50,
    damper: {
      compression: [
        [0.05, 80],
        [0.1, 130],
        [0.3, 250],
        [1.0, 520],
      ],
      rebound: [
        [0.05, 180],
        [0.1, 300],
        [0.3, 560],
        [1.0, 1200],
      ],
      gas: { force: 240 },
    },
    bumpStop: { clearance: 0.055, law: { kind: 'polynomial', coefficients: [20000, 0, 40000000] } },
    stroke: { compression: 0.085, extension: 0.095 },
    notes: 'Invented test corner.',
    ...overrides,
  };
}

/** The document as the server stores it (defaults filled in). */
export const parsed = (doc: SetupInput): Setup => SetupSchema.parse(doc);

let counter = 0;

/** A new setup with revision 1, made through the service as `author` (an audit entry is written). */
export async function freshSetup(db: Db, workspaceId: string, author: TestUser, doc: SetupInput = cornerDocument(`Fixture corner ${++counter}`)): Promise<SetupDetail> {
  const outcome = await createSetup(db, { workspaceId }, author, { setup: parsed(doc) }, new Date());
  if (!outcome.ok) throw new Error(`fixture setup refused: ${outcome.message}`);
  return outcome.value;
}

/** A live share link to a setup's latest revision; returns the raw token and the link id. */
export async function freshShareLink(db: Db, workspaceId: string, author: TestUser, revisionId: string, now: Date, expiresAt?: Date): Promise<{ token: string; linkId: string }> {
  const outcome = await createLink(db, { workspaceId }, author, { objectType: 'setup_revision', objectId: revisionId, expiresAt: expiresAt?.toISOString() ?? null }, now);
  if (!outcome.ok) throw new Error(`fixture share link refused: ${outcome.message}`);
  return { token: outcome.value.token, linkId: outcome.value.link.id };
}
