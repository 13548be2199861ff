import type { Metadata } from "next";
import { ChevronRight } from "lucide-react";
import { viewerFormat } from "@/lib/format/server";
import Link from "next/link";
import { PassStateBadge } from "@/components/passes/pass-state-badge";
import { TimeLeft } from "@/components/passes/time-left";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { NotForThisAccount } from "@/components/shell/not-for-this-account";
import { listShopWork, pageShopPasses } from "@/db/queries/passes";
import { membershipsOf, requireSession } from "@/lib/auth/roles";
import { getSession } from "@/lib/auth/session";
import { cn } from "@/lib/cn";
import { SERVICE_KIND_LABELS } from "@/lib/validation/logbook";
import { SCOPE_LABEL } from "@/lib/validation/passes";

export const metadata: Metadata = { title: "Passes at the shop" };

export const dynamic = "force-dynamic";

/** Passes on one page; a busy shop pages on with "More passes". */
const PASSES_PER_PAGE = 40;

export default async function ShopHomePage({ searchParams }: { searchParams: Promise<{ after?: string }> }) {
  const f = await viewerFormat();
  const session = requireSession(await getSession());
  const now = new Date();
  const { after } = await searchParams;
  const shops = await membershipsOf({ userId: session.user.id });
  // Next runs this page beside the layout's check: refuse here too (the layout shows the same).
  if (shops.length === 0) return <NotForThisAccount area="shop workspace" home="/vehicles" />;
  const shop = shops[0];
  // A stale or edited cursor starts again from the first page rather than failing.
  const page = (cursor: string | undefined) => pageShopPasses({ session, now, cursor, limit: PASSES_PER_PAGE });
  const [{ passes, nextCursor }, work] = shop
    ? await Promise.all([page(after).catch(() => page(undefined)), listShopWork({ session, shopId: shop.shopId, limit: 20 })])
    : [{ passes: [], nextCursor: null }, []];
  const active = passes.filter((p) => p.state === "active");
  const ended = passes.filter((p) => p.state !== "active");

  return (
    <>
      <PageHeader
        title={`Passes at ${shop?.shopName ?? "your shop"}`}
        description="Logbooks that drivers have shared with the shop, for as long as each pass lasts."
      />
      {active.length === 0 && !after ? <p className="mb-6 text-lg text-asphalt-700">No open passes right now. When a driver gives the shop a pass, it shows here and the staff get an e-mail.</p> : null}
      <ul className="grid gap-3 md:grid-cols-2" aria-label="Open passes">
        {active.map((p) => (
          <li key={p.id}>
            <Link
              href={`/shop/passes/${p.id}`}
              className="group block rounded-lg border-2 border-asphalt-200 bg-white p-4 no-underline shadow-card hover:border-groove-600 focus-visible:border-groove-700"
              data-testid="shop-pass"
            >
              <div className="flex items-start justify-between gap-3">
                <div className="min-w-0">
                  <p className="text-xl font-bold text-asphalt-950">{p.vehicles.map((v) => v.nickname).join(", ")}</p>
                  <p className="text-asphalt-700">
                    {p.vehicles.map((v) => [v.year, v.make, v.model].filter(Boolean).join(" ")).join(" · ")}
                  </p>
                  <p className="mt-1 text-asphalt-700">
                    {p.driverName} · <span className="font-semibold">{SCOPE_LABEL[p.scope]}</span>
                  </p>
                </div>
                <ChevronRight aria-hidden className="mt-1 size-6 shrink-0 text-asphalt-400 group-hover:text-groove-700" />
              </div>
              <p className="mt-3 text-lg">
                <TimeLeft endsAt={p.endsAt.toISOString()} serverNow={now.toISOString()} />
              </p>
              {p.note ? <p className="mt-2 rounded bg-asphalt-50 p-2 text-sm text-asphalt-700">“{p.note}”</p> : null}
            </Link>
          </li>
        ))}
      </ul>

      {ended.length > 0 ? (
        <section aria-labelledby="ended" className="mt-8">
          <h2 id="ended" className="mb-2 text-lg font-bold text-asphalt-700">
            Recently ended
          </h2>
          <p className="mb-3 text-sm text-asphalt-600">Shown for two days after they end. The logbooks are closed to the shop.</p>
          <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-asphalt-50 text-asphalt-600">
            {ended.map((p) => (
              <li key={p.id} className={cn("flex flex-wrap items-center justify-between gap-2 px-4 py-3")}>
                <span>
                  {p.vehicles.map((v) => v.nickname).join(", ")} · {p.driverName}
                </span>
                <span className="flex items-center gap-2 text-sm">
                  <PassStateBadge state={p.state} /> {f.dateTime(p.endedAt)}
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      {nextCursor || after ? (
        <nav aria-label="More passes" className="mt-6 flex flex-wrap gap-3">
          {after ? (
            <Link href="/shop" className="rounded-md border-2 border-asphalt-300 bg-white px-4 py-2 font-semibold text-asphalt-900 no-underline hover:border-groove-600">
              First passes
            </Link>
          ) : null}
          {nextCursor ? (
            <Link
              href={`/shop?after=${encodeURIComponent(nextCursor)}`}
              className="rounded-md border-2 border-asphalt-300 bg-white px-4 py-2 font-semibold text-asphalt-900 no-underline hover:border-groove-600"
              data-testid="more-passes"
            >
              More passes
            </Link>
          ) : null}
        </nav>
      ) : null}

      <section aria-labelledby="work" className="mt-8">
        <h2 id="work" className="mb-2 text-lg font-bold">
          Work the shop recorded
        </h2>
        <p className="mb-3 text-sm text-asphalt-600">
          The shop&apos;s own record: what was done, when and by whom. The entries themselves live in each driver&apos;s logbook.
        </p>
        {work.length === 0 ? (
          <p className="text-asphalt-600">Nothing recorded yet.</p>
        ) : (
          <Card className="p-0 sm:p-0">
            <ul className="divide-y divide-asphalt-100">
              {work.map((w) => (
                <li key={w.id} className="flex flex-wrap justify-between gap-2 px-4 py-2">
                  <span>
                    <span className="font-semibold">{SERVICE_KIND_LABELS[w.kind]}</span> · {w.make} {w.model}
                  </span>
                  <span className="text-sm text-asphalt-600">
                    {f.date(w.performedOn)} · {w.technician ?? "former staff"}
                  </span>
                </li>
              ))}
            </ul>
          </Card>
        )}
      </section>
    </>
  );
}
