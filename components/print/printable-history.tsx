// The tire history laid out for paper. On screen it is a narrow page with
// its controls; printed, the app's frame and the controls disappear and the
// page fits A4 and US Letter (the paper choice sets @page).
import Link from "next/link";
import type { PrintableHistory } from "@/lib/print/history";
import { buttonVariants } from "@/components/ui/button-variants";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { PrintButton } from "./print-button";

export function PrintableHistoryView({ h, paper, backHref, pdfHref, paperHref }: { h: PrintableHistory; paper: "a4" | "letter"; backHref: string; pdfHref?: string; paperHref: (p: "a4" | "letter") => string }) {
  const cell = "border-b border-asphalt-200 px-1.5 py-1 text-left align-top";
  return (
    <div className="print-sheet mx-auto max-w-[180mm] text-[11pt] leading-snug">
      <style>{`
        @page { size: ${paper === "letter" ? "letter" : "A4"}; margin: 14mm; }
        @media print {
          header, .no-print, a[href="#main"] { display: none !important; }
          body { background: white !important; }
          #main { max-width: none !important; padding: 0 !important; }
          .print-sheet { max-width: none; font-size: 10pt; }
          .print-sheet section { break-inside: auto; }
          .print-sheet table { break-inside: auto; }
          .print-sheet tr { break-inside: avoid; }
          .print-sheet h2 { break-after: avoid; }
        }
      `}</style>
      <div className="no-print mb-5 flex flex-wrap items-center gap-2">
        <PrintButton />
        {pdfHref ? (
          <a href={pdfHref} download className={buttonVariants({ variant: "secondary" })}>
            Download PDF
          </a>
        ) : null}
        <span className="text-sm text-asphalt-700">Paper:</span>
        <Link href={paperHref("a4")} aria-current={paper === "a4" ? "page" : undefined} className={buttonVariants({ variant: paper === "a4" ? "primary" : "ghost", size: "sm" })}>
          A4
        </Link>
        <Link href={paperHref("letter")} aria-current={paper === "letter" ? "page" : undefined} className={buttonVariants({ variant: paper === "letter" ? "primary" : "ghost", size: "sm" })}>
          Letter
        </Link>
        <Link href={backHref} className={buttonVariants({ variant: "ghost", size: "sm" })}>
          Back to the logbook
        </Link>
      </div>
      <h1 className="text-2xl font-bold">Tire history: {h.title}</h1>
      <p className="text-asphalt-700">{h.subtitle}</p>
      <p className="mb-4 text-sm text-asphalt-600">Printed {h.printedOn} from Fourpatch</p>

      <section className="mb-5">
        <h2 className="mb-2 text-lg font-bold">Tire sets</h2>
        {h.sets.length === 0 ? <p>No sets logged.</p> : null}
        {h.sets.map((s, i) => (
          <div key={i} className="mb-3">
            <h3 className="font-bold">
              {s.title} — {s.level ? <ConditionBadge condition={s.level} /> : s.condition}
            </h3>
            <p className="text-sm text-asphalt-700">{s.detail}</p>
            <div className="overflow-x-auto">
              <table className="w-full border-collapse text-sm">
                <thead>
                  <tr>
                    {["Position", "DOT code", "Made", "Age", "Condition"].map((c) => (
                      <th key={c} scope="col" className={cell}>{c}</th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {s.tires.map((t, j) => (
                    <tr key={j}>
                      <td className={cell}>{t.position}</td>
                      <td className={`${cell} font-mono break-all`}>{t.dotCode}</td>
                      <td className={cell}>{t.made}</td>
                      <td className={cell}>{t.age}</td>
                      <td className={cell}>{t.level ? <ConditionBadge condition={t.level} /> : t.condition}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </div>
        ))}
      </section>

      <section className="mb-5">
        <h2 className="mb-2 text-lg font-bold">Last tread checks, per groove</h2>
        {h.lastChecks.length === 0 ? <p>No tread checks logged.</p> : null}
        {h.lastChecks.map((c, i) => (
          <div key={i} className="mb-3">
            <h3 className="font-bold">
              {c.set}: {c.date} · {c.odometer} · by {c.by}
            </h3>
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr>
                  {["Tire", "Inner", "Centre", "Outer"].map((x) => (
                    <th key={x} scope="col" className={cell}>{x}</th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {c.rows.map((r, j) => (
                  <tr key={j}>
                    <td className={cell}>{r.position}</td>
                    <td className={cell}>{r.inner}</td>
                    <td className={cell}>{r.centre}</td>
                    <td className={cell}>{r.outer}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ))}
      </section>

      <section className="mb-5">
        <h2 className="mb-2 text-lg font-bold">Service history</h2>
        {h.service.length === 0 ? (
          <p>No service logged.</p>
        ) : (
          <ul className="divide-y divide-asphalt-200 text-sm">
            {h.service.map((s, i) => (
              <li key={i} className="py-1.5">
                <strong>{s.date}</strong> · {s.kind} · {s.set} · {s.odometer} · by {s.by}
                {s.notes ? <span className="block text-asphalt-700">{s.notes}</span> : null}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section className="rounded border border-asphalt-300 p-3 text-sm">
        <h2 className="font-bold">Please note</h2>
        {h.cautions.map((c, i) => (
          <p key={i}>{c}</p>
        ))}
      </section>
    </div>
  );
}
