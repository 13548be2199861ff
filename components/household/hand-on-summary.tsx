// What the next owner sees before accepting: the sets with their DOT codes
// and ages, the last checks, the service history; prices and files only
// when the seller ticked them.
import { SafetyNote } from "@/components/ui/safety-note";
import type { HandOnSummary } from "@/db/queries/hand-on";

export function HandOnSummaryView({ summary }: { summary: HandOnSummary }) {
  const h = summary.history;
  return (
    <div className="space-y-4" data-testid="hand-on-summary">
      <p className="text-asphalt-700">{h.subtitle}</p>
      <section className="space-y-2">
        <h2 className="text-lg font-bold">Tire sets</h2>
        {h.sets.map((s, i) => (
          <div key={i} className="rounded border border-asphalt-200 bg-white p-3">
            <p className="font-bold">{s.title} — {s.condition}</p>
            <p className="text-sm text-asphalt-700">{s.detail}</p>
            <ul className="mt-2 space-y-1 text-sm">
              {s.tires.map((t, j) => (
                <li key={j} className="break-words">
                  {t.position}: <span className="font-mono">{t.dotCode}</span> · {t.made} · {t.age} · {t.condition}
                </li>
              ))}
            </ul>
          </div>
        ))}
      </section>
      <section className="space-y-2">
        <h2 className="text-lg font-bold">Last checks</h2>
        {h.lastChecks.length === 0 ? <p>None logged.</p> : null}
        {h.lastChecks.map((c, i) => (
          <p key={i} className="text-sm">
            <strong>{c.set}</strong>: {c.date} · {c.odometer} · {c.rows.map((r) => `${r.position} ${r.centre}`).join(", ")}
          </p>
        ))}
      </section>
      <section className="space-y-2">
        <h2 className="text-lg font-bold">Service history</h2>
        {h.service.length === 0 ? <p>None logged.</p> : null}
        <ul className="space-y-1 text-sm">
          {h.service.map((s, i) => (
            <li key={i}>
              {s.date} · {s.kind} · {s.set} · by {s.by}
            </li>
          ))}
        </ul>
      </section>
      {summary.receipts ? (
        <section className="space-y-2">
          <h2 className="text-lg font-bold">Receipts</h2>
          <ul className="text-sm">
            {summary.receipts.prices.map((p, i) => (
              <li key={i}>{p.set}: {p.price}</li>
            ))}
            {summary.receipts.files.map((f, i) => (
              <li key={`f${i}`}>File: {f}</li>
            ))}
          </ul>
        </section>
      ) : (
        <p className="text-sm text-asphalt-600">Prices and receipt files stay with the seller.</p>
      )}
      <SafetyNote />
    </div>
  );
}
