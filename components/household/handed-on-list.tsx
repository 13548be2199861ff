import Link from "next/link";
import { linkClass } from "@/components/logbook/format";
import { viewerFormat } from "@/lib/format/server";
import { listSnapshots } from "@/db/queries/hand-on";

/** The read-only copies of vehicles the driver handed on. */
export async function HandedOnList({ userId }: { userId: string }) {
  const [rows, f] = await Promise.all([listSnapshots({ userId }), viewerFormat()]);
  if (rows.length === 0) return null;
  return (
    <section aria-labelledby="handed-on-h" className="mt-8 space-y-2">
      <h2 id="handed-on-h" className="text-lg font-bold">
        Handed on
      </h2>
      <ul className="space-y-1">
        {rows.map((r) => (
          <li key={r.id}>
            <Link href={`/vehicles/handed-on/${r.id}`} className={linkClass}>
              {r.title}
            </Link>{" "}
            <span className="text-sm text-asphalt-600">· a read-only copy from {f.dateOf(r.handedOnAt)}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
