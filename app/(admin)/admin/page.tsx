import { LocalTime } from "@/components/household/local-time";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { operatorCounts, searchAccounts } from "@/db/queries/admin";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { DisableToggle } from "./_components/disable-toggle";
import { Pager } from "./_components/pager";
import { SearchForm } from "./_components/search-form";

export const dynamic = "force-dynamic";

// Accounts, as metadata only: operators never see what is in a logbook
// (see DEVELOPERS.md, "The operators' console").
export default async function AdminAccountsPage({ searchParams }: { searchParams: Promise<{ q?: string; cursor?: string }> }) {
  const session = await getSession();
  const { q = "", cursor } = await searchParams;
  const [counts, result] = await Promise.all([
    operatorCounts({ actor: session }),
    searchAccounts({ actor: session, q, cursor }).catch((err) => (err instanceof AppError && err.code === "invalid" ? null : Promise.reject(err))),
  ]);
  return (
    <>
      <PageHeader title="Accounts" description="Who uses Fourpatch: names, plans and counts. Logbook contents are not shown here." />
      <dl className="mb-5 grid grid-cols-2 gap-2 sm:grid-cols-5" data-testid="operator-counts">
        {[
          ["Accounts", counts.accounts],
          ["On Plus", counts.plus],
          ["Disabled", counts.disabled],
          ["Shops", counts.shops],
          ["Vehicles", counts.vehicles],
        ].map(([label, n]) => (
          <div key={label} className="rounded border border-asphalt-200 bg-white p-3">
            <dt className="text-sm text-asphalt-600">{label}</dt>
            <dd className="text-xl font-bold tabular-nums">{Number(n).toLocaleString()}</dd>
          </div>
        ))}
      </dl>
      <SearchForm action="/admin" q={q} label="Search by name or e-mail" />
      {!result ? (
        <Alert tone="warning">That page link is not valid. Start again from the first page.</Alert>
      ) : result.rows.length === 0 ? (
        <p className="text-asphalt-600">No account matches.</p>
      ) : (
        <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white" data-testid="account-list">
          {result.rows.map((a) => (
            <li key={a.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
              <div className="min-w-0 flex-1">
                <p className="break-words font-semibold">{a.name}</p>
                <p className="break-all text-sm text-asphalt-700">{a.email}</p>
                <p className="text-sm text-asphalt-600">
                  {a.role === "admin" ? "Operator" : "Driver"} · {a.plan === "plus" ? "Plus" : "Free"} · {a.vehicles} vehicle(s) · {a.shops} shop(s) · since{" "}
                  <LocalTime iso={a.createdAt} dateOnly /> · <strong>{a.banned ? "disabled" : "active"}</strong>
                </p>
              </div>
              {a.id === session?.user.id ? null : <DisableToggle userId={a.id} disabled={a.banned} name={a.name} />}
            </li>
          ))}
        </ul>
      )}
      <Pager base="/admin" q={q} next={result?.next ?? null} hasPrev={!!cursor} />
    </>
  );
}
