import { readFileSync } from 'node:fs';
import type { Db } from '../../../server/db/database.ts';
import { uploadDynoFile } from '../../../server/dyno/dyno-files.service.ts';
import { uploadDrive } from '../../../server/drives/drives.service.ts';
import type { DriveItem } from '../../../shared/schemas/drive.ts';
import { createRoad } from '../../../server/roads/roads.service.ts';
import type { DynoFileItem } from '../../../shared/schemas/dyno-file.ts';
import type { RoadDetail } from '../../../shared/schemas/road-record.ts';
import { Road, type RoadInput } from '../../../shared/schemas/road.ts';
import type { TestUser } from './people.ts';

/** The invented example dyno files of the repository. */
export const peaksCsv = readFileSync(new URL('../../../examples/dyno/pipit-front-peaks.csv', import.meta.url), 'utf8');
export const seriesCsv = readFileSync(new URL('../../../examples/dyno/pipit-front-sine-record.csv', import.meta.url), 'utf8');

let counter = 0;

/** A new library road made through the service (an audit entry is written). */
export async function freshRoad(db: Db, workspaceId: string, author: TestUser, definition: RoadInput = { kind: 'bump', height: 0.04, length: 0.6, at: 10 }): Promise<RoadDetail> {
  const outcome = await createRoad(db, { workspaceId }, author, { name: `Fixture road ${++counter}`, definition: Road.parse(definition) }, new Date());
  if (!outcome.ok) throw new Error(`fixture road refused: ${outcome.message}`);
  return outcome.value;
}

/** A dyno file kept against a setup, made through the service. */
export async function freshDynoFile(db: Db, workspaceId: string, setupId: string, author: TestUser, text = peaksCsv): Promise<DynoFileItem> {
  const outcome = await uploadDynoFile(db, { workspaceId }, author, setupId, { text, filename: `fixture-${++counter}.csv`, bytes: text.length }, {}, new Date());
  if (!outcome.ok) throw new Error(`fixture dyno file refused: ${outcome.message}`);
  return outcome.value;
}

/** A small measured profile as CSV: 200 m at 0.25 m, elevations in mm. */
export function measuredCsv(rows = 800): string {
  const lines = ['distance [m],elevation [mm]'];
  for (let i = 0; i < rows; i++) {
    const x = i * 0.25;
    lines.push(`${x},${(3 * Math.sin(x / 3) + 1.2 * Math.sin(x * 1.7 + 1) + 0.4 * Math.sin(x * 7.3)).toFixed(3)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** The first two seconds of the example drive (examples/drive/pipit-front-lane-drive.csv). */
export const driveCsv = readFileSync(new URL('../../../examples/drive/pipit-front-lane-drive.csv', import.meta.url), 'utf8').split('\n').slice(0, 403).join('\n');

/** A drive kept against a setup, made through the service. */
export async function freshDrive(db: Db, workspaceId: string, setupId: string, author: TestUser): Promise<DriveItem> {
  const outcome = await uploadDrive(db, { workspaceId }, author, setupId, { text: driveCsv, filename: `drive-${++counter}.csv`, bytes: driveCsv.length }, {}, new Date());
  if (!outcome.ok) throw new Error(`fixture drive refused: ${outcome.message}`);
  return outcome.value;
}
