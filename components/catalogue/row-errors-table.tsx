import type { CatalogueRowError } from "@/lib/catalogue/schema";

/** The problems of a refused catalogue file: one row per problem, by line, as the server lists them. */
export function RowErrorsTable({ rows }: { rows: readonly CatalogueRowError[] }) {
  return (
    <div className="max-h-96 overflow-auto rounded-md border border-danger/30 bg-white">
      <table className="w-full text-left text-sm" aria-label="Problems in the file">
        <thead className="sticky top-0 border-b border-line bg-white text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Line
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Column
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Problem
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-line">
          {rows.map((row, i) => (
            <tr key={`${row.line}-${row.field}-${i}`}>
              <td className="px-3 py-1.5 font-mono tabular-nums">{row.line}</td>
              <td className="px-3 py-1.5 font-mono">{row.field}</td>
              <td className="px-3 py-1.5">{row.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
