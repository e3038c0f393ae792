import {
  type ColumnDef,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  type SortingState,
  useReactTable,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult, StudyViolationKind } from '../../../../shared/schemas/study-result.ts';
import { describePoint } from '../../../../shared/study/describe-point.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Input } from '../../../components/ui/field.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table.tsx';
import { formatSig } from '../../../lib/format.ts';
import { useStudyDisplay } from '../model/display.ts';
import type { StudyView } from '../model/study-view.ts';

interface Row {
  point: StudyPointResult;
  label: string;
  score: number | null;
  front: boolean;
  best: boolean;
}

const PAGE = 25;

/**
 * Every point: swept values, whether it meets the limits, its weighted score, and its figures.
 * Sortable by any column, filtered by words or to the points within the limits or on the front;
 * clicking a row picks the point.
 */
export function PointsTable({ view, selected, onSelect }: { view: StudyView; selected: number | null; onSelect: (index: number) => void }) {
  const def = view.definition;
  const d = useStudyDisplay();
  const { figureLabel, figureText, parameterLabel, parameterText } = d;
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState('');
  const [only, setOnly] = useState<'all' | 'feasible' | 'front'>('all');

  const rows = useMemo<Row[]>(() => {
    const scores = view.compromise?.ok ? view.compromise.scores : null;
    const front = new Set(view.tradeOff?.front ?? []);
    const best = view.compromise?.ok ? view.compromise.winner : -1;
    return view.points
      .map((point, pos) => ({ point, label: describePoint(def.axes, point.values, d.parameterWords), score: scores?.[pos] ?? null, front: front.has(pos), best: pos === best }))
      .filter((r) => (only === 'feasible' ? r.point.feasible : only === 'front' ? r.front : true));
  }, [view, def.axes, only, d]);

  const figures = useMemo(() => {
    const keys: StudyFigureKey[] = [def.comfortFigure, def.gripFigure, ...def.objectives.map((o) => o.figure), 'strokeUsed', 'liftOffFraction', 'tyreLoadMin'];
    return [...new Set(keys)].filter((k) => view.points.some((p) => p.figures[k] !== undefined));
  }, [def, view.points]);

  const columns = useMemo<ColumnDef<Row>[]>(
    () => [
      { id: 'index', header: '#', accessorFn: (r) => r.point.index, meta: { numeric: true }, cell: (c) => <span className="figures">{c.getValue<number>()}</span> },
      ...def.axes.map<ColumnDef<Row>>((a) => ({
        id: a.parameter,
        header: parameterLabel(a.parameter),
        accessorFn: (r) => r.point.values[a.parameter] ?? null,
        meta: { numeric: true },
        cell: (c) => <span className="figures">{c.getValue<number | null>() === null ? '—' : parameterText(a.parameter, c.getValue<number>())}</span>,
      })),
      {
        id: 'limits',
        header: 'Limits',
        accessorFn: (r) => (r.point.feasible ? 0 : 1),
        cell: (c) =>
          c.row.original.point.feasible ? (
            <span className="text-ok">met</span>
          ) : (
            <span title={c.row.original.point.violations.map((v) => v.message).join('\n')}>
              <Tag tone="signal">{brokenWords(c.row.original.point)}</Tag>
            </span>
          ),
      },
      {
        id: 'score',
        header: 'Score',
        accessorFn: (r) => r.score ?? Infinity,
        meta: { numeric: true },
        cell: (c) => (
          <span className="figures">
            {c.row.original.score === null ? '—' : formatSig(c.row.original.score, 3)}
            {c.row.original.best && <span className="ml-1 font-sans text-comfort">★</span>}
          </span>
        ),
      },
      { id: 'front', header: 'Front', accessorFn: (r) => (r.front ? 0 : 1), cell: (c) => (c.row.original.front ? <span className="text-accent">on</span> : '') },
      ...figures.map<ColumnDef<Row>>((k) => ({
        id: k,
        header: figureLabel(k),
        accessorFn: (r) => r.point.figures[k] ?? null,
        sortUndefined: 'last',
        meta: { numeric: true },
        cell: (c) => {
          const sd = c.row.original.point.spread?.[k]?.sd;
          return (
            <span className="figures">
              {figureText(k, c.getValue<number | null>())}
              {sd !== undefined && <span className="text-ink-faint"> ±{figureText(k, sd)}</span>}
            </span>
          );
        },
      })),
    ],
    [def.axes, figures],
  );

  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _id, value: string) => row.original.label.toLowerCase().includes(value.toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: PAGE } },
  });

  const pages = table.getPageCount();
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center gap-3">
        <Input aria-label="Filter points" placeholder="Filter, e.g. rebound ×1.2" value={filter} onChange={(e) => setFilter(e.target.value)} className="max-w-xs" />
        <div role="radiogroup" aria-label="Show" className="flex gap-1 text-sm">
          {(['all', 'feasible', 'front'] as const).map((k) => (
            <label key={k} className={`cursor-pointer rounded border px-2 py-1 ${only === k ? 'border-accent bg-accent-wash text-accent-strong' : 'border-rule text-ink-soft'}`}>
              <input type="radio" name="points-only" className="sr-only" checked={only === k} onChange={() => setOnly(k)} />
              {k === 'all' ? 'All points' : k === 'feasible' ? 'Within the limits' : 'On the front'}
            </label>
          ))}
        </div>
        <span className="text-sm text-ink-faint">{table.getFilteredRowModel().rows.length} shown</span>
      </div>
      <div className="overflow-x-auto">
        <Table caption="Study points">
          <THead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const numeric = (header.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                  return (
                    <Th key={header.id} numeric={numeric} aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}>
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-ink">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className={sorted ? 'text-accent' : 'text-ink-faint/50'}>
                          {sorted === 'asc' ? '↑' : sorted === 'desc' ? '↓' : '↕'}
                        </span>
                      </button>
                    </Th>
                  );
                })}
              </tr>
            ))}
          </THead>
          <TBody>
            {table.getRowModel().rows.map((row) => (
              <Tr
                key={row.id}
                aria-selected={row.original.point.index === selected}
                aria-label={row.original.label}
                onClick={() => onSelect(row.original.point.index)}
                className={`cursor-pointer ${row.original.point.index === selected ? 'bg-accent-wash/70' : 'hover:bg-paper-sunk/60'}`}
              >
                {row.getVisibleCells().map((cell) => (
                  <Td key={cell.id} numeric={(cell.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </Td>
                ))}
              </Tr>
            ))}
          </TBody>
        </Table>
      </div>
      {pages > 1 && (
        <div className="mt-2 flex items-center gap-2 text-sm">
          <Button size="sm" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
            Previous
          </Button>
          <span className="figures text-ink-soft">
            page {table.getState().pagination.pageIndex + 1} of {pages}
          </span>
          <Button size="sm" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
            Next
          </Button>
        </div>
      )}
    </div>
  );
}

/** Short names of the limits a point breaks, for the table (the full reasons are in the tooltip). */
const limitWords: Record<StudyViolationKind, string> = {
  maxStrokeUsed: 'stroke',
  maxLiftOffFraction: 'lift-off',
  minTyreLoad: 'tyre load',
  minStaticSag: 'sag',
  maxStaticSag: 'sag',
  notCheckable: 'not checkable',
  runFailed: 'run failed',
  setupInvalid: 'invalid setup',
};

function brokenWords(point: StudyPointResult): string {
  return `broken: ${[...new Set(point.violations.map((v) => limitWords[v.kind]))].join(', ')}`;
}
