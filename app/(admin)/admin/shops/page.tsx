import { Alert } from "@/components/ui/alert";
import { PageHeader } from "@/components/ui/page-header";
import { searchShops } from "@/db/queries/admin";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { Pager } from "../_components/pager";
import { SearchForm } from "../_components/search-form";

export const dynamic = "force-dynamic";

export default async function AdminShopsPage({ searchParams }: { searchParams: Promise<{ q?: string; cursor?: string }> }) {
  const session = await getSession();
  const { q = "", cursor } = await searchParams;
  const result = await searchShops({ actor: session, q, cursor }).catch((err) => (err instanceof AppError && err.code === "invalid" ? null : Promise.reject(err)));
  return (
    <>
      <PageHeader title="Shops" description="Shops with their town and staff count." />
      <SearchForm action="/admin/shops" q={q} label="Search by shop name or town" />
      {!result ? (
        <Alert tone="warning">That page link is not valid. Start again from the first page.</Alert>
      ) : result.rows.length === 0 ? (
        <p className="text-asphalt-600">No shop matches.</p>
      ) : (
        <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white" data-testid="shop-list">
          {result.rows.map((s) => (
            <li key={s.id} className="flex flex-wrap justify-between gap-2 px-4 py-3">
              <span className="min-w-0 break-words font-semibold">{s.name}</span>
              <span className="text-asphalt-600">
                {s.town ?? "—"} · {s.staff} staff
              </span>
            </li>
          ))}
        </ul>
      )}
      <Pager base="/admin/shops" q={q} next={result?.next ?? null} hasPrev={!!cursor} />
    </>
  );
}
