"use client";
// The calendar feed: make a link, copy it, scan it, or turn it off.
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useFormat } from "@/components/format/format-provider";
import { CalendarPlus, Check, Copy, Laptop, Globe, Smartphone } from "lucide-react";
import { useState, useTransition } from "react";
import { createFeedLink, turnOffFeed, type NewFeed } from "@/app/(driver)/reminders/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

type FeedState = { createdAt: string; lastFetchedAt: string | null } | null;

function CopyField({ label, value, id }: { label: string; value: string; id: string }) {
  const [copied, setCopied] = useState(false);
  const [failed, setFailed] = useState(false);
  async function copy() {
    try {
      await navigator.clipboard.writeText(value);
      setCopied(true);
      setFailed(false);
      setTimeout(() => setCopied(false), 2500);
    } catch {
      // Clipboard access can be refused (plain http on a LAN address): select the text for a manual copy.
      setFailed(true);
      (document.getElementById(id) as HTMLInputElement | null)?.select();
    }
  }
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-asphalt-800">
        {label}
      </label>
      <div className="flex gap-2">
        <input
          id={id}
          readOnly
          value={value}
          onFocus={(e) => e.currentTarget.select()}
          className="min-h-11 w-full min-w-0 flex-1 rounded border border-asphalt-300 bg-asphalt-50 px-3 font-mono text-sm text-asphalt-900"
          data-testid={`${id}-value`}
        />
        <Button type="button" variant="secondary" onClick={copy} aria-describedby={`${id}-status`}>
          {copied ? <Check aria-hidden className="size-4" /> : <Copy aria-hidden className="size-4" />}
          {copied ? "Copied" : "Copy"}
        </Button>
      </div>
      <p id={`${id}-status`} role="status" className="min-h-5 text-xs text-asphalt-600">
        {copied ? "Copied to the clipboard." : failed ? "This browser did not allow copying: the link is selected, copy it by hand." : ""}
      </p>
    </div>
  );
}

export function FeedPanel({ feed }: { feed: FeedState; timezone?: string }) {
  const f = useFormat();
  const [fresh, setFresh] = useState<NewFeed | null>(null);
  const [state, setState] = useState<FeedState>(feed);
  const [error, setError] = useState<string | null>(null);
  const [confirmOff, setConfirmOff] = useState(false);
  const [pending, start] = useTransition();
  const [working, setWorking] = useState<"new" | "off" | null>(null);

  function makeLink() {
    setWorking("new");
    start(async () => {
      const r = await createFeedLink({});
      if (r.status === "ok") {
        setFresh(r.data);
        setState({ createdAt: new Date().toISOString(), lastFetchedAt: null });
        setError(null);
      } else setError(r.message);
      setWorking(null);
    });
  }
  function turnOff() {
    setWorking("off");
    start(async () => {
      const r = await turnOffFeed({});
      if (r.status === "ok") {
        setFresh(null);
        setState(null);
        setConfirmOff(false);
        setError(null);
      } else setError(r.message);
      setWorking(null);
    });
  }

  return (
    <div className="space-y-4" data-testid="feed-panel">
      {error ? <Alert tone="error">{error}</Alert> : null}
      {fresh ? (
        <div className="space-y-4">
          <Alert tone="success" title="Your feed link is ready">
            Copy it now or scan the code: for your safety Fourpatch keeps only a fingerprint of this link and cannot show it again.
          </Alert>
          <div className="grid gap-4 md:grid-cols-[1fr_auto] md:items-start">
            <div className="space-y-3">
              <CopyField id="feed-https" label="Feed address (https) — paste into any calendar app" value={fresh.https} />
              <CopyField id="feed-webcal" label="Subscribe address (webcal) — opens the calendar app directly" value={fresh.webcal} />
              <a href={fresh.webcal} className="inline-flex min-h-11 items-center gap-2 rounded bg-groove-700 px-4 py-2 font-semibold text-white no-underline hover:bg-groove-800">
                <CalendarPlus aria-hidden className="size-5" />
                Subscribe on this device
              </a>
            </div>
            <figure className="mx-auto w-48 text-center md:mx-0">
              <div
                className="rounded-lg border border-asphalt-200 bg-white p-2 [&>svg]:h-auto [&>svg]:w-full"
                role="img"
                aria-label="QR code of the subscribe address, for a phone's camera"
                dangerouslySetInnerHTML={{ __html: fresh.qrSvg }}
              />
              <figcaption className="mt-1 text-xs text-asphalt-600">Scan with your phone&apos;s camera to subscribe.</figcaption>
            </figure>
          </div>
        </div>
      ) : state ? (
        <p className="text-asphalt-700" data-testid="feed-active">
          A feed link is active since {f.dateOf(state.createdAt)}
          {state.lastFetchedAt
            ? `; a calendar app last read it on ${f.dateTime(state.lastFetchedAt)}.`
            : "; no calendar app has read it yet."}{" "}
          Fourpatch keeps only a fingerprint of the link, so it cannot show it again. To subscribe another device, make a new link — the old
          one then stops working, so subscribe your other devices again with the new one.
        </p>
      ) : (
        <p className="text-asphalt-700">
          Put every tire date into your own calendar. Fourpatch makes a private address that calendar apps subscribe to; the dates update
          by themselves when you log checks or new tires.
        </p>
      )}

      <div className="flex flex-wrap gap-2">
        {state ? (
          // A new link ends the old one: every calendar subscribed to it stops getting dates. Said first.
          <ConfirmDialog
            tone="primary"
            trigger={
              <Button type="button" variant="secondary" pending={pending && working === "new"} pendingLabel="Making a link…">
                {fresh ? "Make another link (this one stops)" : "Make a new feed link"}
              </Button>
            }
            title="Make a new feed link?"
            description={
              <p>
                The current link stops working at once. Every calendar subscribed to it stops getting tire dates, and its dates disappear; you will
                need to subscribe each device again with the new link.
              </p>
            }
            confirmLabel="Make a new link"
            cancelLabel="Keep the current link"
            onConfirm={makeLink}
          />
        ) : (
          <Button type="button" variant="primary" onClick={makeLink} pending={pending && working === "new"} pendingLabel="Making a link…">
            Make my calendar link
          </Button>
        )}
        {state && !confirmOff ? (
          <Button type="button" variant="secondary" onClick={() => setConfirmOff(true)} disabled={pending}>
            Turn the feed off
          </Button>
        ) : null}
      </div>
      {confirmOff ? (
        <div className="space-y-2 rounded border border-condition-replace/40 bg-condition-replace-bg p-3" role="group" aria-label="Confirm turning the feed off">
          <p className="text-sm font-semibold text-condition-replace">Turn the feed off? Subscribed calendars stop getting updates, and their tire dates disappear.</p>
          <div className="flex gap-2">
            <Button type="button" variant="danger" size="sm" onClick={turnOff} pending={pending && working === "off"} pendingLabel="Turning off…">
              Yes, turn it off
            </Button>
            <Button type="button" variant="secondary" size="sm" onClick={() => setConfirmOff(false)}>
              Keep it
            </Button>
          </div>
        </div>
      ) : null}

      <div className="grid gap-3 border-t border-asphalt-100 pt-4 sm:grid-cols-3">
        <div className="space-y-1">
          <h3 className="flex items-center gap-2 font-semibold text-asphalt-900">
            <Smartphone aria-hidden className="size-4" /> Phone calendar
          </h3>
          <p className="text-sm text-asphalt-700">
            Scan the QR code with the camera, or open this page on the phone and tap “Subscribe on this device”. Confirm the subscription in
            the calendar app.
          </p>
        </div>
        <div className="space-y-1">
          <h3 className="flex items-center gap-2 font-semibold text-asphalt-900">
            <Laptop aria-hidden className="size-4" /> Desktop calendar
          </h3>
          <p className="text-sm text-asphalt-700">
            Look for “New calendar subscription” or “Add calendar from the internet” in the app&apos;s menu and paste the https address.
            Choose to refresh every day if asked.
          </p>
        </div>
        <div className="space-y-1">
          <h3 className="flex items-center gap-2 font-semibold text-asphalt-900">
            <Globe aria-hidden className="size-4" /> Web calendar
          </h3>
          <p className="text-sm text-asphalt-700">
            In the calendar&apos;s settings, add another calendar “from URL” and paste the https address. Web calendars refresh on their own
            schedule, sometimes only once a day.
          </p>
        </div>
      </div>
      <p className="text-xs text-asphalt-600">
        Treat the address like a password: anyone who has it can read your tire dates (never your logbook). If it leaks, make a new link.
      </p>
    </div>
  );
}
