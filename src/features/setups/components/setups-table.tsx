import {
  type ColumnFiltersState,
  createColumnHelper,
  type FilterFn,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  type SortingState,
  useReactTable,
} from '@tanstack/react-table';
import { type ReactNode, useMemo, useState } from 'react';
import { Link } from 'react-router';
import type { SetupSummary } from '../../../../shared/schemas/setup-record.ts';
import { DataTable } from '../../../components/ui/data-table.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { formatDate, formatDateTime, formatSig } from '../../../lib/format.ts';

const column = createColumnHelper<SetupSummary>();

/** Search across the words of a row: name, vehicle, corner, last message, people. */
const searchRow: FilterFn<SetupSummary> = (row, _columnId, query: string) => {
  const s = row.original;
  const haystack = [s.name, s.vehicle?.name, s.corner, s.latestMessage, s.changedBy.name, s.createdBy.name].join(' ').toLowerCase();
  return query
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => haystack.includes(word));
};

const figure = (value: number | undefined, digits: number, unit: string) =>
  value === undefined ? (
    <span className="text-ink-faint">—</span>
  ) : (
    <>
      {formatSig(value, digits)}
      <span className="ml-0.5 text-xs font-light text-ink-faint">{unit}</span>
    </>
  );

export interface SetupsTableProps {
  workspaceId: string;
  setups: SetupSummary[];
  /** Controls placed at the end of the filter bar (e.g. "show archived"). */
  extraFilters?: ReactNode;
}

/** The workspace's setups: searchable, filterable by vehicle and corner, sortable by any column. */
export function SetupsTable({ workspaceId, setups, extraFilters }: SetupsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'changedAt', desc: true }]);
  const [search, setSearch] = useState('');
  const [filters, setFilters] = useState<ColumnFiltersState>([]);
  const vehicles = useMemo(() => [...new Set(setups.map((s) => s.vehicle?.name).filter((n): n is string => Boolean(n)))].sort(), [setups]);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Setup',
        meta: { className: 'min-w-[13rem]' },
        cell: (info) => (
          <span className="inline-flex items-center gap-1.5">
            <Link to={`/w/${workspaceId}/corners/${info.row.original.id}`} className="font-medium text-ink hover:text-accent hover:underline">
              {info.getValue()}
            </Link>
            {info.row.original.archivedAt && <Tag>archived</Tag>}
          </span>
        ),
      }),
      column.accessor((s) => s.vehicle?.name ?? '', {
        id: 'vehicle',
        header: 'Vehicle, corner',
        filterFn: 'equalsString',
        meta: { className: 'whitespace-nowrap' },
        cell: (info) => (
          <span className="inline-flex items-center gap-1.5">
            {info.getValue() || <span className="text-ink-faint">—</span>}
            {info.row.original.corner && <Tag>{info.row.original.corner}</Tag>}
          </span>
        ),
      }),
      // filtered on, not shown: the corner sits beside the vehicle
      column.accessor((s) => s.corner ?? '', { id: 'corner', filterFn: 'equalsString' }),
      column.accessor('latestRevision', { header: 'Rev.', meta: { numeric: true }, cell: (info) => `r${info.getValue()}` }),
      column.accessor((s) => s.figures?.bodyHz, { id: 'bodyHz', header: 'Body', meta: { numeric: true }, sortUndefined: 'last', cell: (info) => figure(info.getValue(), 3, 'Hz') }),
      column.accessor((s) => s.figures?.wheelHopHz, { id: 'wheelHz', header: 'Wheel hop', meta: { numeric: true }, sortUndefined: 'last', cell: (info) => figure(info.getValue(), 3, 'Hz') }),
      column.accessor((s) => s.figures?.bodyDampingRatio, { id: 'zeta', header: 'Body ζ', meta: { numeric: true }, sortUndefined: 'last', cell: (info) => figure(info.getValue(), 2, '') }),
      column.accessor('latestMessage', {
        header: 'Last change',
        enableSorting: false,
        cell: (info) => (
          <span className="block max-w-[10.5rem] truncate text-ink-soft" title={info.getValue()}>
            {info.getValue()}
          </span>
        ),
      }),
      column.accessor('changedAt', {
        header: 'Changed',
        meta: { numeric: true },
        cell: (info) => (
          <span className="whitespace-nowrap">
            <span title={formatDateTime(info.getValue())}>{formatDate(info.getValue())}</span>
            <span className="block font-sans text-xs text-ink-faint">{info.row.original.changedBy.name}</span>
          </span>
        ),
      }),
    ],
    [workspaceId],
  );

  const table = useReactTable({
    data: setups,
    columns,
    state: { sorting, globalFilter: search, columnFilters: filters, columnVisibility: { corner: false } },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    onColumnFiltersChange: setFilters,
    globalFilterFn: searchRow,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getRowId: (s) => s.id,
  });
  const filterValue = (id: string) => (filters.find((f) => f.id === id)?.value as string | undefined) ?? '';
  const setFilter = (id: string, value: string) => table.getColumn(id)?.setFilterValue(value || undefined);
  const shown = table.getRowModel().rows.length;

  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center gap-2 text-sm">
        <input
          type="search"
          aria-label="Search setups"
          placeholder="Search name, vehicle, message, person"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          className="h-8 w-72 rounded-sm border border-rule-strong bg-paper-raised px-2 text-sm"
        />
        <select aria-label="Filter by vehicle" value={filterValue('vehicle')} onChange={(e) => setFilter('vehicle', e.target.value)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5">
          <option value="">Every vehicle</option>
          {vehicles.map((v) => (
            <option key={v} value={v}>
              {v}
            </option>
          ))}
        </select>
        <select aria-label="Filter by corner" value={filterValue('corner')} onChange={(e) => setFilter('corner', e.target.value)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5">
          <option value="">Front and rear</option>
          <option value="front">Front</option>
          <option value="rear">Rear</option>
        </select>
        {extraFilters}
        <span className="figures ml-auto text-xs text-ink-faint">
          {shown} of {setups.length}
        </span>
      </div>
      <DataTable table={table} caption="Corner setups" rowLabel={(s) => s.name} />
      {shown === 0 && setups.length > 0 && <p className="mt-2 text-sm text-ink-faint">No setup matches the search and filters.</p>}
    </div>
  );
}
