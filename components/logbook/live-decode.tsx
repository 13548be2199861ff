"use client";
// What a DOT code and a tire size mean, shown as the driver types them. The
// decoding (lib/tires: date codes, ages, sizes, load and speed tables) loads
// once there is something to decode, or when the field is focused
// (`preloadLiveDecode`): an empty form shows only the hint, so the forms'
// first load carries none of it. A value the server already has (editing a
// vehicle) is decoded in the server's HTML as before.
import dynamic from "next/dynamic";
import type { SetKind } from "@/lib/tires";

const load = () => import("./live-decode-detail");
export const preloadLiveDecode = () => void load();

const Reading = () => <p className="text-xs text-asphalt-600">Reading it…</p>;
const DotDecoded = dynamic(() => load().then((m) => m.DotDecoded), { loading: Reading });
const SizeDecoded = dynamic(() => load().then((m) => m.SizeDecoded), { loading: Reading });

export function DotPreview({ code, kind, id }: { code: string | undefined; kind: SetKind; id?: string }) {
  if (!code || !code.trim()) return <p id={id} className="text-xs text-asphalt-600">The last four digits of the DOT code give the week and year of manufacture.</p>;
  return (
    <div id={id}>
      <DotDecoded code={code} kind={kind} />
    </div>
  );
}

export function SizePreview({ size, placard, winter, id }: { size: string | undefined; placard: string | null | undefined; winter: boolean; id?: string }) {
  if (!size || !size.trim()) return <p id={id} className="text-xs text-asphalt-600">As printed on the sidewall, for example 205/55 R16 91V.</p>;
  return (
    <div id={id}>
      <SizeDecoded size={size} placard={placard} winter={winter} />
    </div>
  );
}
