import { DEFAULT_UNIT_PREFERENCES, StoredUnitPreferences, type UnitPreferences } from '../../shared/schemas/unit-preferences.ts';
import { readStored } from '../core/stored-json.ts';
import type { Queryable } from '../db/database.ts';
import { setUnitPreferences } from './users.repository.ts';

/** The person's display units; the defaults until they pick. */
export function unitPreferencesOf(row: { unit_preferences: string | null }): UnitPreferences {
  return row.unit_preferences === null ? { ...DEFAULT_UNIT_PREFERENCES } : readStored(StoredUnitPreferences, row.unit_preferences, 'unit preferences');
}

export async function saveUnitPreferences(db: Queryable, userId: string, units: UnitPreferences): Promise<UnitPreferences> {
  await setUnitPreferences(db, userId, JSON.stringify(units));
  return units;
}
