import { flexRender, type Table as TanTable } from '@tanstack/react-table';
import { TBody, THead, Table, Td, Th, Tr } from './table.tsx';

/** Column meta our tables read: `numeric` right-aligns the column and sets it in figures. */
export interface ColumnLook {
  numeric?: boolean;
  className?: string;
}

function look(meta: unknown): ColumnLook {
  return (meta ?? {}) as ColumnLook;
}

/**
 * Renders a TanStack table instance in the house style. Sortable columns get a button in
 * their header; the arrow shows the current direction.
 */
export function DataTable<T>({ table, caption, rowLabel }: { table: TanTable<T>; caption: string; rowLabel?: (row: T) => string }) {
  return (
    <Table caption={caption}>
      <THead>
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id}>
            {group.headers.map((header) => {
              const { numeric, className } = look(header.column.columnDef.meta);
              const sorted = header.column.getIsSorted();
              const content = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
              return (
                <Th
                  key={header.id}
                  numeric={numeric}
                  className={className}
                  aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                >
                  {header.column.getCanSort() ? (
                    <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-ink">
                      {content}
                      <span aria-hidden="true" className={sorted ? 'text-accent' : 'text-ink-faint/50'}>
                        {sorted === 'asc' ? '↑' : sorted === 'desc' ? '↓' : '↕'}
                      </span>
                    </button>
                  ) : (
                    content
                  )}
                </Th>
              );
            })}
          </tr>
        ))}
      </THead>
      <TBody>
        {table.getRowModel().rows.map((row) => (
          <Tr key={row.id} aria-label={rowLabel?.(row.original)}>
            {row.getVisibleCells().map((cell) => {
              const { numeric, className } = look(cell.column.columnDef.meta);
              return (
                <Td key={cell.id} numeric={numeric} className={className}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </Td>
              );
            })}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
