import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router';
import { type RoadListItem, roadKinds } from '../../../../shared/schemas/road-record.ts';
import { DataTable } from '../../../components/ui/data-table.tsx';
import { Input, Select } from '../../../components/ui/field.tsx';
import { Tag } from '../../../components/ui/tag.tsx';
import { formatDateTime, formatSig } from '../../../lib/format.ts';
import { isoText, kindWords } from './road-words.ts';

const column = createColumnHelper<RoadListItem>();

/**
 * The road library as a table: search by name or person, filter by kind, sort any column.
 * Each row says who changed the road last and when.
 */
export function RoadsTable({ roads, hrefOf }: { roads: RoadListItem[]; hrefOf: (road: RoadListItem) => string }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'changedAt', desc: true }]);
  const [search, setSearch] = useState('');
  const [filters, setFilters] = useState<ColumnFiltersState>([]);
  const kindFilter = (filters.find((f) => f.id === 'kind')?.value as string | undefined) ?? '';

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <Link to={hrefOf(info.row.original)} className="font-medium text-accent hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('kind', {
        header: 'Kind',
        filterFn: 'equals',
        cell: (info) => (
          <span className="inline-flex items-center gap-1.5">
            {kindWords[info.getValue()]}
            {info.row.original.source === 'measured' && <Tag tone="accent">uploaded</Tag>}
          </span>
        ),
      }),
      column.accessor((r) => r.figures.iso?.gdn0 ?? -1, {
        id: 'iso',
        header: 'ISO class',
        cell: (info) => <span className="figures">{isoText(info.row.original)}</span>,
        meta: { numeric: true },
      }),
      column.accessor((r) => r.figures.length ?? -1, {
        id: 'length',
        header: 'Length',
        cell: (info) => {
          const l = info.row.original.figures.length;
          return l === null ? '—' : `${l >= 100 ? Math.round(l) : formatSig(l, 3)} m`;
        },
        meta: { numeric: true },
      }),
      column.accessor((r) => r.changedBy.name, { id: 'changedBy', header: 'Changed by' }),
      column.accessor('changedAt', { header: 'Changed', cell: (info) => formatDateTime(info.getValue()), meta: { numeric: true } }),
    ],
    [hrefOf],
  );

  const table = useReactTable({
    data: roads,
    columns,
    state: { sorting, globalFilter: search, columnFilters: filters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setSearch,
    onColumnFiltersChange: setFilters,
    globalFilterFn: (row, _id, value: string) => {
      const q = value.trim().toLowerCase();
      if (!q) return true;
      const r = row.original;
      return [r.name, kindWords[r.kind], r.changedBy.name, r.createdBy.name, r.figures.iso?.className ?? ''].some((s) => s.toLowerCase().includes(q));
    },
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const shown = table.getRowModel().rows.length;
  return (
    <div className="grid gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <Input type="search" aria-label="Search roads" placeholder="Search name, kind, person…" value={search} onChange={(e) => setSearch(e.target.value)} className="max-w-72" />
        <Select aria-label="Filter by kind" value={kindFilter} onChange={(e) => setFilters(e.target.value ? [{ id: 'kind', value: e.target.value }] : [])} className="max-w-52">
          <option value="">every kind</option>
          {roadKinds.map((k) => (
            <option key={k} value={k}>
              {kindWords[k]}
            </option>
          ))}
        </Select>
        <span className="text-xs text-ink-faint">
          {shown} of {roads.length} roads
        </span>
      </div>
      <DataTable table={table} caption="Roads in this workspace" rowLabel={(r) => r.name} />
    </div>
  );
}
