import type { DuesStatus, RosterRowDto } from '@app/shared';
import { DUES_STATUSES, DUES_STATUS_LABELS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_equalsString,
  flexRender,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  sortFn_text,
  tableFeatures,
  useTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { readableDate } from '@/lib/format-date';
import { countOf } from '@/lib/plural';

const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic, text: sortFn_text },
  filterFns: { equalsString: filterFn_equalsString },
});
const col = createColumnHelper<typeof features, RosterRowDto>();

export interface RosterTableProps {
  rows: RosterRowDto[];
  selected: Set<number>;
  onToggle: (userId: number) => void;
}

/** The member roster: sortable columns, a status filter and a search over name and e-mail. */
export function RosterTable({ rows, selected, onToggle }: RosterTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'displayName', desc: false }]);
  const [search, setSearch] = useState('');
  const [status, setStatus] = useState<DuesStatus | ''>('');
  const columns = useMemo(
    () =>
      col.columns([
        col.display({
          id: 'select',
          header: () => <span className="sr-only">Select</span>,
          cell: (c) => (
            <input
              type="checkbox"
              aria-label={`Select ${c.row.original.displayName}`}
              checked={selected.has(c.row.original.userId)}
              onChange={() => onToggle(c.row.original.userId)}
            />
          ),
        }),
        col.accessor('displayName', { header: 'Member' }),
        col.accessor('email', { header: 'E-mail' }),
        col.accessor('planName', { header: 'Plan', cell: (c) => c.getValue() ?? '—' }),
        col.accessor('paidThrough', {
          header: 'Paid through',
          cell: (c) => {
            const iso = c.getValue();
            return iso ? <time dateTime={iso}>{readableDate(iso)}</time> : 'Never';
          },
        }),
        col.accessor((r) => r.status ?? '', {
          id: 'status',
          header: 'Status',
          filterFn: 'equalsString',
          cell: (c) => {
            const s = c.row.original.status;
            return s ? DUES_STATUS_LABELS[s] : 'No plan';
          },
        }),
        col.accessor('owedMinor', {
          header: 'Owed',
          cell: (c) =>
            c.row.original.currency ? formatMoney(c.getValue(), c.row.original.currency) : '—',
        }),
      ]),
    [selected, onToggle],
  );
  const table = useTable({
    features,
    data: rows,
    columns,
    state: {
      sorting,
      globalFilter: search,
      columnFilters: status ? [{ id: 'status', value: status }] : [],
    },
    onSortingChange: setSorting,
    globalFilterFn: (row, _id, value: string) => {
      const q = value.trim().toLowerCase();
      return (
        !q ||
        row.original.displayName.toLowerCase().includes(q) ||
        row.original.email.toLowerCase().includes(q)
      );
    },
  });
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap gap-3">
        <label className="flex flex-col text-sm font-bold">
          Search
          <input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="Name or e-mail"
            className="rounded-md border border-sand-300 bg-white px-3 py-2 font-normal"
          />
        </label>
        <label className="flex flex-col text-sm font-bold">
          Status
          <select
            value={status}
            onChange={(e) => setStatus(e.target.value as DuesStatus | '')}
            className="rounded-md border border-sand-300 bg-white px-3 py-2 font-normal"
          >
            <option value="">All</option>
            {DUES_STATUSES.map((s) => (
              <option key={s} value={s}>
                {DUES_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </label>
      </div>
      {/* Below md one card per member, so status, owed and the select box stay on a phone's screen. */}
      <ul aria-label="Members and their dues" className="flex flex-col gap-2 md:hidden">
        {table.getRowModel().rows.map((r) => {
          const m = r.original;
          return (
            <li
              key={r.id}
              className="flex items-start gap-3 rounded-lg border border-sand-300 bg-sand-50 p-3 text-sm"
            >
              <input
                type="checkbox"
                className="mt-1 h-5 w-5"
                aria-label={`Select ${m.displayName}`}
                checked={selected.has(m.userId)}
                onChange={() => onToggle(m.userId)}
              />
              <div className="flex min-w-0 flex-1 flex-col gap-0.5">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <span className="font-bold">{m.displayName}</span>
                  <span className="font-bold" data-testid="roster-status">
                    {m.status ? DUES_STATUS_LABELS[m.status] : 'No plan'}
                  </span>
                </div>
                <span className="break-all text-ink-700">{m.email}</span>
                <span>
                  {m.planName ?? 'No plan'} · paid through{' '}
                  {m.paidThrough ? readableDate(m.paidThrough) : 'never'} · owes{' '}
                  {m.currency ? formatMoney(m.owedMinor, m.currency) : '—'}
                </span>
              </div>
            </li>
          );
        })}
      </ul>
      <div className="hidden overflow-x-auto md:block">
        <table className="w-full min-w-[40rem] text-sm">
          <caption className="sr-only">Members and their dues</caption>
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      aria-sort={
                        sorted === 'asc'
                          ? 'ascending'
                          : sorted === 'desc'
                            ? 'descending'
                            : undefined
                      }
                      className="border-b-2 border-ink-700 px-2 py-1 text-left"
                    >
                      {h.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={h.column.getToggleSortingHandler()}
                          className="font-bold underline-offset-2 hover:underline"
                        >
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true">
                            {sorted === 'asc' ? ' ▲' : sorted === 'desc' ? ' ▼' : ''}
                          </span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-sand-300">
                {r.getAllCells().map((c) => (
                  <td key={c.id} className="px-2 py-1">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-sm text-ink-700">
        {table.getRowModel().rows.length} of {countOf(rows.length, 'member', 'members')} shown
      </p>
    </div>
  );
}
