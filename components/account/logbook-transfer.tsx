"use client";
// Taking the logbook elsewhere and bringing one in: the export zip is
// fetched as a stream so the page can show how far it got, and the import
// sends the zip as it is and shows the server's reason when it refuses.
import { Download, Upload } from "lucide-react";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardTitle } from "@/components/ui/card";
import { Field } from "@/components/ui/field";

const mb = (n: number) => `${(n / 1024 / 1024).toLocaleString(undefined, { maximumFractionDigits: 1 })} MB`;

export function ExportCard() {
  const [progress, setProgress] = useState<{ got: number; estimate: number } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const busy = progress !== null && !done;
  return (
    <Card className="space-y-3">
      <CardTitle>Take your logbook with you</CardTitle>
      <p className="text-sm text-asphalt-700">
        One zip: a JSON document of everything (its format is written down and versioned), a CSV per kind of record for spreadsheets, and your
        receipts and photos. Any Fourpatch account can import it.
      </p>
      <Button
        variant="secondary"
        pending={busy}
        pendingLabel="Preparing the zip…"
        onClick={async () => {
          setError(null);
          setDone(false);
          setProgress({ got: 0, estimate: 0 });
          try {
            const res = await fetch("/api/account/export");
            if (!res.ok || !res.body) throw new Error("The export could not be made. Nothing was changed; try again.");
            const estimate = Number(res.headers.get("x-fourpatch-size-estimate") ?? "0");
            const name = /filename="([^"]+)"/.exec(res.headers.get("content-disposition") ?? "")?.[1] ?? "fourpatch-logbook.zip";
            const reader = res.body.getReader();
            const parts: BlobPart[] = [];
            let got = 0;
            for (;;) {
              const { done: end, value } = await reader.read();
              if (end) break;
              parts.push(value as Uint8Array<ArrayBuffer>);
              got += value.byteLength;
              setProgress({ got, estimate });
            }
            const url = URL.createObjectURL(new Blob(parts, { type: "application/zip" }));
            const a = document.createElement("a");
            a.href = url;
            a.download = name;
            a.click();
            setTimeout(() => URL.revokeObjectURL(url), 10_000);
            setDone(true);
          } catch (err) {
            setProgress(null);
            setError(err instanceof Error ? err.message : "The export could not be made.");
          }
        }}
      >
        <Download aria-hidden className="size-4" />
        Download everything (.zip)
      </Button>
      {progress ? (
        <div className="space-y-1" aria-live="polite">
          <progress
            className="h-2 w-full"
            max={100}
            value={done ? 100 : progress.estimate ? Math.min(99, Math.round((progress.got / progress.estimate) * 100)) : undefined}
            aria-label="Export progress"
          />
          <p className="text-sm text-asphalt-700" data-testid="export-progress">
            {done ? `Done: ${mb(progress.got)}.` : `${mb(progress.got)} received${progress.estimate ? ` of about ${mb(progress.estimate)}` : ""}…`}
          </p>
        </div>
      ) : null}
      {error ? <Alert tone="error">{error}</Alert> : null}
    </Card>
  );
}

export function ImportCard() {
  const router = useRouter();
  const file = useRef<HTMLInputElement>(null);
  const [mode, setMode] = useState<"empty" | "merge">("empty");
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [result, setResult] = useState<string | null>(null);
  return (
    <Card className="space-y-3">
      <CardTitle>Bring a logbook in</CardTitle>
      <p className="text-sm text-asphalt-700">
        Import a Fourpatch export zip. It is checked whole before anything is saved; a damaged or foreign file is refused and nothing changes.
      </p>
      <form
        noValidate
        className="space-y-3"
        onSubmit={async (e) => {
          e.preventDefault();
          setError(null);
          setResult(null);
          const f = file.current?.files?.[0];
          if (!f) {
            setError("Choose the export's .zip file.");
            return;
          }
          setPending(true);
          const res = await fetch(`/api/account/import?mode=${mode}`, { method: "POST", headers: { "content-type": "application/zip" }, body: f }).catch(() => null);
          setPending(false);
          const body = (await res?.json().catch(() => null)) as { imported?: { vehicles: number; sets: number; checks: number; files: number }; error?: { message: string } } | null;
          if (!res?.ok || !body?.imported) {
            setError(body?.error?.message ?? "The import did not go through. Nothing was saved.");
            return;
          }
          const i = body.imported;
          setResult(`Imported ${i.vehicles} vehicle(s), ${i.sets} set(s), ${i.checks} tread check(s) and ${i.files} file(s).`);
          router.refresh();
        }}
      >
        <Field label="Export file (.zip)">
          {({ id }) => <input id={id} ref={file} type="file" accept=".zip,application/zip" className="block w-full min-w-0 text-sm" />}
        </Field>
        <fieldset className="space-y-1">
          <legend className="text-sm font-semibold text-asphalt-800">How</legend>
          <label className="flex items-center gap-2">
            <input type="radio" name="mode" value="empty" checked={mode === "empty"} onChange={() => setMode("empty")} />
            As this account&apos;s logbook (the account has no vehicles yet)
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="mode" value="merge" checked={mode === "merge"} onChange={() => setMode("merge")} />
            As additional vehicles next to mine
          </label>
        </fieldset>
        <Button type="submit" variant="secondary" pending={pending} pendingLabel="Checking and importing…">
          <Upload aria-hidden className="size-4" />
          Import
        </Button>
      </form>
      {error ? <Alert tone="error" title="Not imported">{error}</Alert> : null}
      {result ? <Alert tone="success">{result}</Alert> : null}
    </Card>
  );
}
