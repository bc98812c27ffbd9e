import { DateTime } from "@/components/ui/date-time";
import type { RevisionSummary } from "@/lib/projects/service";

/** Awaits the revisions read started by the page, so the page header need not wait for it. */
export async function RevisionList({ revisions }: { revisions: Promise<RevisionSummary[]> }) {
  const rows = await revisions;
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">Layout revisions, newest first</caption>
      <thead className="border-b border-line text-xs uppercase tracking-wide text-muted">
        <tr>
          <th scope="col" className="py-2 pr-4 font-medium">
            No.
          </th>
          <th scope="col" className="py-2 pr-4 font-medium">
            Message
          </th>
          <th scope="col" className="py-2 pr-4 font-medium">
            Author
          </th>
          <th scope="col" className="py-2 font-medium">
            Saved
          </th>
        </tr>
      </thead>
      <tbody className="divide-y divide-line">
        {rows.map((r) => (
          <tr key={r.number}>
            <td className="py-2 pr-4 font-mono">{r.number}</td>
            <td className="py-2 pr-4">{r.message}</td>
            <td className="py-2 pr-4">{r.authorName ?? <span className="text-muted">former member</span>}</td>
            <td className="py-2 text-muted">
              <DateTime iso={r.createdAt} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
