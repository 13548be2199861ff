"use client";
// The access log as the driver reads it: who, from which shop, did what, when.
import { useFormat } from "@/components/format/format-context";

const ACTION_LABEL: Record<string, string> = {
  read_logbook: "Opened the logbook",
  add_service: "Recorded work",
  add_check: "Recorded a tread check",
  edit_check: "Changed a tread check",
  delete_check: "Deleted a tread check",
  edit_service: "Changed recorded work",
  delete_service: "Deleted recorded work",
  add_set: "Logged a fitted set",
  read_set: "Opened a set",
  swap_set: "Swapped sets",
  download: "Opened a file",
  upload: "Added a file",
};

export function actionLabel(action: string) {
  return ACTION_LABEL[action] ?? action.replace(/_/g, " ").replace(/^./, (c) => c.toUpperCase());
}

type AccessRow = { id: string; at: Date | string; actorName: string; shopName: string; action: string; detail: string | null; count?: number; lastAt?: Date | string | null };

export function AccessLogTable({ rows }: { rows: AccessRow[] }) {
  const f = useFormat();
  if (rows.length === 0) return <p className="text-sm text-asphalt-600">No shop has opened this logbook yet.</p>;
  return (
    <div>
      <table className="w-full text-left text-sm">
        <thead className="border-b border-asphalt-200 text-asphalt-600">
          <tr>
            <th scope="col" className="py-2 pr-3 font-semibold">When</th>
            <th scope="col" className="py-2 pr-3 font-semibold">Who</th>
            <th scope="col" className="py-2 font-semibold">What</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-asphalt-100">
          {rows.map((r) => (
            <tr key={r.id}>
              <td className="py-2 pr-3 tabular-nums">{f.dateTime(r.at)}</td>
              <td className="py-2 pr-3">
                {r.actorName} <span className="text-asphalt-600">· {r.shopName}</span>
              </td>
              <td className="py-2">
                {actionLabel(r.action)}
                {r.detail ? <span className="text-asphalt-600"> · {r.detail.replace(/_/g, " ")}</span> : null}
                {/* Reads of one visit are one row with a count. */}
                {r.count && r.count > 1 ? (
                  <span className="text-asphalt-600">
                    {" "}
                    · {f.count(r.count, { one: "time", other: "times" })}{r.lastAt ? `, last ${f.dateTime(r.lastAt)}` : ""}
                  </span>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
