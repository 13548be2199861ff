import { listShops } from "@/db/queries/admin";
import { PageHeader } from "@/components/ui/page-header";
import { getSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export default async function AdminShopsPage() {
  const shops = await listShops({ actor: await getSession() });
  return (
    <>
      <PageHeader title="Shops" description={`${shops.length} shops`} />
      <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
        {shops.map((s) => (
          <li key={s.id} className="flex justify-between px-4 py-3">
            <span className="font-semibold">{s.name}</span>
            <span className="text-asphalt-600">
              {s.town ?? "—"} · {s.staff} staff
            </span>
          </li>
        ))}
      </ul>
    </>
  );
}
