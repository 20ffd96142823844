import { columnLabel } from './columns';

/** One option per column, named from the header where there is one. */
export function ColumnOptions({ columns, header }: { columns: readonly number[]; header: readonly string[] | null }) {
  return (
    <>
      {columns.map((c) => (
        <option key={c} value={String(c)}>
          {columnLabel(c, header)}
        </option>
      ))}
    </>
  );
}
