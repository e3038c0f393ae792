import { useMemo } from 'react';
import { listText } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import type { SharedStudy } from '../../../../shared/schemas/study-record.ts';
import { studyRoadNames } from '../../../../shared/study/collect.ts';
import { Notice } from '../../../components/ui/notice.tsx';
import { ResultsCaution } from '../../../components/ui/results-caution.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { studyView } from '../model/study-view.ts';
import { statusWords, sweepWords } from './study-list.tsx';
import { savedPointName, useStudyDisplay } from '../model/display.ts';
import { StudyResults } from './study-results.tsx';

/**
 * A study opened from a read-only link (the `/shared/:token` page renders this when the link's
 * object is a study): the same views as in the workspace, without any action. Works signed out.
 * `copyAction` is the page's "copy into my workspace" control, when the visitor may use it.
 */
export function SharedStudyView({ shared, copyAction }: { shared: SharedStudy; copyAction?: React.ReactNode }) {
  const s = shared.study;
  const speedUnit = useUnits().speed;
  const d = useStudyDisplay();
  const view = useMemo(() => studyView(s.definition, s.points, s.basePoint, true, d), [s, d]);
  const roadNames = useMemo(() => studyRoadNames(s.definition, s.roads), [s]);
  const status = statusWords[s.status];
  return (
    <article aria-label={`Shared study ${s.name}`} className="space-y-4">
      <header className="border-b border-rule pb-3">
        <p className="text-xs font-medium tracking-wide text-ink-faint uppercase">Study shared read-only from {shared.workspaceName}</p>
        <h1 className="text-xl font-semibold">{s.name}</h1>
        <p className="mt-0.5 text-sm text-ink-soft">
          From {s.base.setupName ?? 'a setup'} <span className="figures">r{s.base.revisionNumber}</span> · {sweepWords(s.axes, d)} · {roadNames.join(', ')}
          {s.speeds.length > 0 && <span className="figures"> at {listText(s.speeds, speedUnit)}</span>}
        </p>
        <p className="mt-1 flex flex-wrap items-center gap-2 text-xs text-ink-faint">
          <Tag tone={status.tone}>{status.text}</Tag>
          Shared by {shared.sharedBy} on {formatDateTime(shared.sharedAt)}
          {shared.expiresAt ? `, until ${formatDateTime(shared.expiresAt)}` : ''}
          {s.baseline && <Tag tone="accent">baseline: {savedPointName(d, s.definition.axes, s.baseline)}</Tag>}
        </p>
        {copyAction && <div className="mt-2">{copyAction}</div>}
      </header>
      {view.points.length > 0 ? <StudyResults view={view} roadNames={roadNames} baselineIndex={s.baseline?.pointIndex ?? null} /> : <Notice>This study has no saved results yet.</Notice>}
      <ResultsCaution />
    </article>
  );
}
