import { Figure } from '../../../../components/ui/figure.tsx';
import { rideJudgement } from '../../../../../shared/sim/metrics/rms-method.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import { BEST_MARGIN, betterRules, displayUnitOf, groupTitles, bestIndex, rowsFor, type FigureGroup } from '../../model/figure-rows.ts';
import { type ComparedRun, differenceText } from '../../model/compare.ts';
import { Swatch } from './swatch.tsx';

const groups: FigureGroup[] = ['comfort', 'grip', 'package', 'damper', 'modal'];

/**
 * Every figure side by side: the first run is the reference; the others show their difference
 * against it. The better value of a ranked row is marked; the rule each row uses is stated.
 */
export function CompareTable({ runs }: { runs: ComparedRun[] }) {
  const rows = rowsFor(runs.map((r) => r.view.result));
  const judged = runs.map((r) => rideJudgement(r.view.result.road.kind, r.view.result.metrics));
  const chosen = useUnits();
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <p className="px-3 pt-2 text-xs text-ink-soft">
        “best” marks a figure more than {BEST_MARGIN * 100} % better than every other run; closer than that, no run is named.
      </p>
      <table className="w-full border-collapse text-sm" aria-label="Figures compared">
        <thead className="border-b border-rule-strong bg-paper-sunk/70 text-left">
          <tr>
            <th scope="col" className="h-9 px-3 text-xs font-semibold text-ink-soft">
              Figure
            </th>
            <th scope="col" className="px-2 text-xs font-semibold text-ink-soft">
              Ranking
            </th>
            {runs.map((r, i) => (
              <th key={r.key} scope="col" className="px-3 text-right text-xs font-semibold text-ink">
                <span className="inline-flex items-center gap-1.5">
                  <Swatch slot={r.slot} />
                  {r.label}
                  {i === 0 && <span className="font-normal text-ink-faint">(reference)</span>}
                </span>
              </th>
            ))}
          </tr>
        </thead>
        {groups.map((group) => (
          <tbody key={group} className="[&>tr]:border-b [&>tr]:border-rule/70">
            <tr className="bg-paper/70">
              <th colSpan={2 + runs.length} scope="colgroup" className={`px-3 pt-2.5 pb-1 text-left text-xs font-semibold tracking-wide uppercase ${group === 'comfort' ? 'text-comfort' : group === 'grip' ? 'text-grip' : 'text-ink-soft'}`}>
                {groupTitles[group]}
              </th>
            </tr>
            {group === 'comfort' && (
              <tr data-row="verdict">
                <th scope="row" className="h-8 px-3 text-left font-normal text-ink">
                  ISO 2631-1 comfort reaction (RMS method)
                </th>
                <td className="px-2 text-xs whitespace-nowrap text-ink-faint">{betterRules.unranked}</td>
                {judged.map((j, i) => (
                  <td key={runs[i].key} className="px-3 py-1 text-right align-top text-xs">
                    {j.verdict ? (
                      <span className="text-comfort">{j.verdict.bands.join(' / ')}</span>
                    ) : (
                      <span className="text-ink-soft" title={j.why ?? undefined}>
                        none: {j.crestAboveLimit ? `crest factor ${j.crest.toFixed(1)} > 9` : 'single event'}
                      </span>
                    )}
                  </td>
                ))}
              </tr>
            )}
            {rows
              .filter((row) => row.group === group)
              .map((row) => {
                const values = runs.map((r) => row.value(r.view.result));
                const best = bestIndex(row, values);
                return (
                  <tr key={row.key} data-row={row.key} className="hover:bg-accent-wash/40">
                    <th scope="row" className="h-8 px-3 text-left font-normal text-ink">
                      {row.label}
                    </th>
                    <td className="px-2 text-xs whitespace-nowrap text-ink-faint">{betterRules[row.better]}</td>
                    {runs.map((r, i) => {
                      const v = values[i];
                      const diff = i === 0 ? null : differenceText(row, values[0], v, chosen);
                      return (
                        <td key={r.key} className={`px-3 py-1 text-right align-top ${best === i ? 'bg-ok-wash/70' : ''}`} data-best={best === i || undefined}>
                          {v === undefined ? (
                            <span className="text-ink-faint">—</span>
                          ) : (
                            <span className="inline-flex items-baseline gap-1">
                              {best === i && (
                                <span className="text-2xs font-semibold text-ok" title={`best here: ${betterRules[row.better]}, by more than ${BEST_MARGIN * 100} %`}>
                                  best
                                </span>
                              )}
                              <Figure value={v} unit={displayUnitOf(row, chosen)} label={`${row.label}, ${r.label}`} className={best === i ? 'font-semibold' : ''} />
                            </span>
                          )}
                          {diff && (
                            <span className="figures block text-2xs text-ink-faint">
                              {diff.abs}
                              {diff.rel ? ` · ${diff.rel}` : ''}
                            </span>
                          )}
                        </td>
                      );
                    })}
                  </tr>
                );
              })}
          </tbody>
        ))}
      </table>
    </div>
  );
}
