import { listAccounts } from "@/db/queries/admin";
import { PageHeader } from "@/components/ui/page-header";
import { getSession } from "@/lib/auth/session";
import { DisableToggle } from "./_components/disable-toggle";

export const dynamic = "force-dynamic";

export default async function AdminAccountsPage() {
  const session = await getSession();
  const accounts = await listAccounts({ actor: session });
  return (
    <>
      <PageHeader title="Accounts" description={`${accounts.length} accounts`} />
      <div className="overflow-x-auto rounded-lg border border-asphalt-200 bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-asphalt-100 text-asphalt-700">
            <tr>
              <th scope="col" className="px-3 py-2">Name</th>
              <th scope="col" className="px-3 py-2">E-mail</th>
              <th scope="col" className="px-3 py-2">Role</th>
              <th scope="col" className="px-3 py-2">Plan</th>
              <th scope="col" className="px-3 py-2">Shops</th>
              <th scope="col" className="px-3 py-2">State</th>
              <th scope="col" className="px-3 py-2"><span className="sr-only">Action</span></th>
            </tr>
          </thead>
          <tbody>
            {accounts.map((a) => (
              <tr key={a.id} className="border-t border-asphalt-100">
                <td className="px-3 py-2 font-semibold">{a.name}</td>
                <td className="px-3 py-2">{a.email}</td>
                <td className="px-3 py-2">{a.role === "admin" ? "operator" : "driver"}</td>
                <td className="px-3 py-2">{a.plan === "plus" ? "Plus" : "Free"}</td>
                <td className="px-3 py-2">{a.shops}</td>
                <td className="px-3 py-2">{a.banned ? "disabled" : "active"}</td>
                <td className="px-3 py-2">
                  {a.id === session?.user.id ? null : <DisableToggle userId={a.id} disabled={!!a.banned} name={a.name} />}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
