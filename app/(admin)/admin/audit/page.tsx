import { LocalTime } from "@/components/household/local-time";
import { Alert } from "@/components/ui/alert";
import { PageHeader } from "@/components/ui/page-header";
import { readAudit } from "@/db/queries/admin";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { Pager } from "../_components/pager";

export const dynamic = "force-dynamic";

const ACTIONS: Record<string, string> = { disable_account: "disabled the account", enable_account: "enabled the account again" };

// Every operator action, newest first. The table refuses updates and deletes
// (a database trigger), so this page can only ever grow.
export default async function AuditPage({ searchParams }: { searchParams: Promise<{ cursor?: string }> }) {
  const session = await getSession();
  const { cursor } = await searchParams;
  const result = await readAudit({ actor: session, cursor }).catch((err) => (err instanceof AppError && err.code === "invalid" ? null : Promise.reject(err)));
  return (
    <>
      <PageHeader title="Audit log" description="Who did what, when, to whom. Entries cannot be changed or removed." />
      {!result ? (
        <Alert tone="warning">That page link is not valid. Start again from the first page.</Alert>
      ) : result.rows.length === 0 ? (
        <p className="text-asphalt-600">No operator action yet.</p>
      ) : (
        <ol className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white" data-testid="audit-list">
          {result.rows.map((r) => (
            <li key={r.id} className="px-4 py-3">
              <p className="break-words">
                <strong className="break-all">{r.actorEmail}</strong> {ACTIONS[r.action] ?? r.action} <strong className="break-all">{r.targetLabel ?? r.targetId}</strong>
                {r.detail ? <span className="text-asphalt-600"> ({r.detail})</span> : null}
              </p>
              <p className="text-sm text-asphalt-600">
                <LocalTime iso={r.at} />
              </p>
            </li>
          ))}
        </ol>
      )}
      <Pager base="/admin/audit" q="" next={result?.next ?? null} hasPrev={!!cursor} />
    </>
  );
}
