import type { ChartExportInfo } from '../../../components/charts/export-context.tsx';
import { exportStem, safeWords } from '../../../lib/export-name.ts';
import { mPerSToKmh } from '../../../../shared/units.ts';

/**
 * File stem and image caption of a study's exports: the study, its base setup and revision (when
 * known: a shared study hides it), its roads and speeds —
 * `damper-sweep_front-left-r3_class-c-demo_60kmh`, "Study Damper sweep · Front left r3 · Class C demo · 60 km/h".
 */
export function studyExportInfo(studyName: string, roadNames: readonly string[], speeds: readonly number[], base?: { setupName: string; revisionNumber: number }): ChartExportInfo {
  const kmh = speeds.map((v) => Math.round(mPerSToKmh(v)));
  const speedPart = kmh.length ? `${kmh.join('-')}kmh` : 'speed-swept';
  const stem = [safeWords(studyName, 40) || 'study', base && exportStem({ setupName: base.setupName, revision: base.revisionNumber }), safeWords(roadNames.join(' '), 40), speedPart].filter(Boolean).join('_');
  const context = [`Study ${studyName}`, base && `${base.setupName} r${base.revisionNumber}`, roadNames.join(', '), kmh.length ? `${kmh.join(', ')} km/h` : 'speed swept'].filter(Boolean).join(' · ');
  return { stem, context };
}
