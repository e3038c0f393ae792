import { randomUUID } from 'node:crypto';
import type { Corner } from '../../../shared/schemas/setup-record.ts';
import { type DamperCurve, Setup, type SetupInput } from '../../../shared/schemas/setup.ts';
import type { Role } from '../../../shared/schemas/workspace.ts';
import { curveFromParameters } from '../../../shared/sim/damper-builder.ts';
import { recordAudit } from '../../audit/audit.service.ts';
import { addRevisionInTx, insertNewSetupInTx } from '../../setups/setups.service.ts';
import { insertVehicle } from '../../vehicles/index.ts';
import type { Queryable } from '../database.ts';
import { DEMO_USERS } from '../../core/demo-people.ts';
import type { SeedStep } from './seed-context.ts';
import type { Actor } from '../../core/actor.ts';

/*
 * Invented corners of the three Tallis & Brume cars. Spring rates were tuned so the body modes
 * land where the team would put them (Pipit front ≈ 1.2 Hz, rear ≈ 1.35 Hz; rear above front,
 * common flat-ride practice), body damping ratios near 0.3. Dampers are digressive, built from
 * parameters with the core's damper builder, rebound about twice compression (common practice).
 */

/** A digressive damper: knee at 0.08 m/s, slope above the knee 35 % of the bleed, rebound `reboundRatio` × compression. */
function digressive(bleed: number, reboundRatio = 2): { compression: DamperCurve; rebound: DamperCurve } {
  const curve = (c: number) =>
    curveFromParameters({ lowSpeedSlope: c, kneeVelocity: 0.08, highSpeedSlope: 0.35 * c, shape: 'digressive' }).map(
      ([v, f]) => [v, Math.round(f)] as [number, number],
    ) as unknown as DamperCurve;
  return { compression: curve(bleed), rebound: curve(bleed * reboundRatio) };
}

/** Progressive elastomer bump stop: F = c1·δ + c3·δ³ at the wheel. */
const bumpStop = (clearance: number, c1: number, c3: number) => ({ clearance, law: { kind: 'polynomial' as const, coefficients: [c1, 0, c3] } });
/** Rebound spring inside the damper, as a short table at the wheel. */
const reboundStop = (clearance: number, scale = 1) => ({
  clearance,
  law: {
    kind: 'table' as const,
    points: [
      [0.005, 1500 * scale],
      [0.01, 5000 * scale],
      [0.02, 20000 * scale],
    ] as [number, number][],
  },
});

interface DemoCorner {
  vehicle: 'pipit' | 'corrie' | 'skerry';
  corner: Corner;
  /** Revisions oldest first: the document, who saved it, its message, days before the seed. */
  revisions: Array<{ doc: SetupInput; by: Role; message: string; daysAgo: number }>;
}

const pipitFront: SetupInput = {
  name: 'Brume Pipit front, baseline',
  sprungMass: 310,
  unsprungMass: 36,
  springRate: 20500,
  motionRatio: 0.95,
  tyreRate: 210000,
  tyreDamping: 50,
  damper: { ...digressive(2200), gas: { pressure: 1_200_000, rodArea: 0.000201 } },
  bumpStop: bumpStop(0.055, 20000, 4e7),
  reboundStop: reboundStop(0.075),
  stroke: { compression: 0.085, extension: 0.095 },
  notes: 'MacPherson strut, 185/60 R15 tyre at 2.3 bar. Mid trim, driver only.',
};

const pipitRear: SetupInput = {
  name: 'Brume Pipit rear, baseline',
  sprungMass: 235,
  unsprungMass: 32,
  springRate: 18000,
  motionRatio: 1,
  tyreRate: 200000,
  tyreDamping: 50,
  damper: { ...digressive(1700), gas: { force: 230 } },
  bumpStop: bumpStop(0.06, 18000, 3.5e7),
  reboundStop: reboundStop(0.08),
  stroke: { compression: 0.09, extension: 0.1 },
  notes: 'Twist beam, spring and damper close to the wheel (motion ratio 1).',
};

const corrieFront: SetupInput = {
  name: 'Brume Corrie front, touring',
  sprungMass: 420,
  unsprungMass: 44,
  springRate: 24500,
  motionRatio: 0.95,
  tyreRate: 240000,
  tyreDamping: 60,
  damper: { ...digressive(2600), gas: { force: 280 } },
  bumpStop: bumpStop(0.06, 25000, 5e7),
  reboundStop: reboundStop(0.08, 1.3),
  stroke: { compression: 0.09, extension: 0.1 },
  notes: 'Estate, diesel engine. 205/55 R16 at 2.5 bar.',
};

const corrieRear: SetupInput = {
  name: 'Brume Corrie rear, touring',
  sprungMass: 390,
  unsprungMass: 47,
  springRate: 33500,
  motionRatio: 0.9,
  tyreRate: 235000,
  tyreDamping: 60,
  damper: { ...digressive(3400), gas: { force: 300 } },
  bumpStop: bumpStop(0.065, 30000, 6e7),
  reboundStop: reboundStop(0.085, 1.3),
  stroke: { compression: 0.1, extension: 0.105 },
  notes: 'Multi-link rear, half load in the boot.',
};

const skerryFront: SetupInput = {
  name: 'Brume Skerry front, road',
  sprungMass: 215,
  unsprungMass: 29,
  springRate: 46500,
  motionRatio: 0.7,
  tyreRate: 230000,
  tyreDamping: 40,
  damper: { ...digressive(4150), gas: { pressure: 1_500_000, rodArea: 0.000154, polytropic: { volume: 0.00009, exponent: 1.2 } } },
  bumpStop: bumpStop(0.045, 30000, 8e7),
  reboundStop: reboundStop(0.06),
  stroke: { compression: 0.07, extension: 0.075 },
  notes: 'Double wishbone, damper on the lower arm. 205/45 R17.',
};

const skerryRear: SetupInput = {
  name: 'Brume Skerry rear, road',
  sprungMass: 250,
  unsprungMass: 33,
  springRate: 59500,
  motionRatio: 0.75,
  tyreRate: 235000,
  tyreDamping: 40,
  damper: { ...digressive(4950), gas: { force: 260 } },
  bumpStop: bumpStop(0.045, 35000, 9e7),
  reboundStop: reboundStop(0.06),
  stroke: { compression: 0.075, extension: 0.08 },
  notes: 'Double wishbone, mid engine. 225/45 R17.',
};

const firmerRebound = (doc: SetupInput, factor: number): SetupInput => ({
  ...doc,
  damper: { ...doc.damper, rebound: doc.damper.rebound.map(([v, f]) => [v, Math.round(v > 0.08 ? f * factor : f)] as [number, number]) },
});

const pipitFront2 = firmerRebound(pipitFront, 1.15);
const pipitFront3: SetupInput = { ...pipitFront2, bumpStop: bumpStop(0.05, 20000, 4e7) };
const corrieRear2: SetupInput = { ...corrieRear, sprungMass: 410, springRate: 35500, notes: 'Multi-link rear, full load in the boot (towing trim).' };

export const demoCorners: DemoCorner[] = [
  {
    vehicle: 'pipit',
    corner: 'front',
    revisions: [
      { doc: pipitFront, by: 'engineer', message: 'Baseline from the first rig session', daysAgo: 21 },
      { doc: pipitFront2, by: 'lead', message: 'Rebound +15 % above the knee for body control over crests', daysAgo: 12 },
      { doc: pipitFront3, by: 'engineer', message: 'Bump stop clearance 55 → 50 mm after the kerb test', daysAgo: 4 },
    ],
  },
  { vehicle: 'pipit', corner: 'rear', revisions: [{ doc: pipitRear, by: 'engineer', message: 'Baseline from the first rig session', daysAgo: 21 }] },
  { vehicle: 'corrie', corner: 'front', revisions: [{ doc: corrieFront, by: 'engineer', message: 'Carried over from the previous estate, new tyre rate', daysAgo: 30 }] },
  {
    vehicle: 'corrie',
    corner: 'rear',
    revisions: [
      { doc: corrieRear, by: 'engineer', message: 'Half-load baseline', daysAgo: 30 },
      { doc: corrieRear2, by: 'lead', message: 'Full-load trim: heavier corner, spring +2 N/mm to hold the ride height', daysAgo: 9 },
    ],
  },
  { vehicle: 'skerry', corner: 'front', revisions: [{ doc: skerryFront, by: 'lead', message: 'Road package, first cut', daysAgo: 16 }] },
  { vehicle: 'skerry', corner: 'rear', revisions: [{ doc: skerryRear, by: 'lead', message: 'Road package, first cut', daysAgo: 16 }] },
];

const vehicles = {
  pipit: { name: 'Brume Pipit', notes: 'Small hatchback, mid trim. Target: settled body over broken town roads.' },
  corrie: { name: 'Brume Corrie', notes: 'Estate. The rear carries the load; check both half and full load.' },
  skerry: { name: 'Brume Skerry', notes: 'Light sports car, road package.' },
} as const;

const daysBefore = (now: Date, days: number) => new Date(now.getTime() - days * 86_400_000);

function actorOf(role: Role, users: Record<Role, string>): Actor {
  const person = DEMO_USERS.find((u) => u.role === role);
  if (!person) throw new Error(`no demo person with role ${role}`);
  return { id: users[role], name: person.name };
}

async function seedVehicle(trx: Queryable, workspaceId: string, actor: Actor, key: keyof typeof vehicles, at: Date): Promise<string> {
  const id = randomUUID();
  const { name, notes } = vehicles[key];
  await insertVehicle(trx, { id, workspace_id: workspaceId, name, notes, created_by: actor.id, created_at: at.toISOString(), updated_at: at.toISOString() });
  await recordAudit(trx, { workspaceId, actorId: actor.id, action: 'vehicle.created', entityType: 'vehicle', entityId: id, summary: `${actor.name} created vehicle "${name}".`, at });
  return id;
}

/** Three vehicles, six corners, revisions by different people; through the same services the API uses. */
export const seedSetups: SeedStep = async (trx, ctx) => {
  const ws = { workspaceId: ctx.workspaceId };
  const vehicleIds: Partial<Record<keyof typeof vehicles, string>> = {};
  for (const c of demoCorners) {
    const [first, ...later] = c.revisions;
    const createdAt = daysBefore(ctx.now, first.daysAgo);
    vehicleIds[c.vehicle] ??= await seedVehicle(trx, ctx.workspaceId, actorOf(first.by, ctx.users), c.vehicle, createdAt);
    const created = await insertNewSetupInTx(
      trx,
      ws,
      actorOf(first.by, ctx.users),
      { document: Setup.parse(first.doc), vehicleId: vehicleIds[c.vehicle], corner: c.corner, message: first.message },
      { source: null, action: 'setup.created', verb: 'created setup' },
      createdAt,
    );
    if (!created.ok) throw new Error(`demo setup ${first.doc.name} refused: ${created.message}`);
    for (const r of later) {
      const added = await addRevisionInTx(trx, ws, actorOf(r.by, ctx.users), created.value.id, { document: Setup.parse(r.doc), message: r.message, source: null }, daysBefore(ctx.now, r.daysAgo));
      if (!added.ok) throw new Error(`demo revision of ${first.doc.name} refused: ${added.message}`);
    }
  }
};
