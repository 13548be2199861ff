// The technician's plan of the vehicle: the car's outline with its two axles
// and, at each wheel, that tire's tread-profile glyph with its condition, DOT
// week and age. Each glyph draws the inner groove toward the car's centreline,
// as the technician sees the tire from the driver's seat looking down. A tap
// on "Measure" jumps to that tire's boxes in the record-work form.
import { ChevronUp } from "lucide-react";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { TireTreadProfile } from "@/components/visual/tread-profile";
import type { TireView } from "@/db/queries/logbook-view";
import { cn } from "@/lib/cn";
import type { Formatter } from "@/lib/format";
import type { DepthUnit } from "@/lib/units";
import { POSITION_LABELS } from "@/lib/validation/labels";

type Side = "left" | "right";
const WHEELS = [
  { position: "front_left", side: "left", axle: "front" },
  { position: "front_right", side: "right", axle: "front" },
  { position: "rear_left", side: "left", axle: "rear" },
  { position: "rear_right", side: "right", axle: "rear" },
] as const;

function dotWeek(t: TireView) {
  if (t.dot?.ok) return `Week ${t.dot.week} of ${t.dot.year}`;
  if (t.dot && !t.dot.ok) return t.dot.error;
  return "Date unknown";
}

function WheelStation({ tire, side, limitMm, depthUnit, measurable, f }: { tire: TireView; side: Side; limitMm: number; depthUnit: DepthUnit; measurable: boolean; f: Formatter }) {
  // Inner toward the centreline: on the left wheels that is the glyph's right side.
  const innerSide: Side = side === "left" ? "right" : "left";
  const near = side === "left" ? "items-end text-right" : "items-start text-left";
  return (
    <div className={cn("relative flex min-w-0 flex-col gap-1.5 rounded-lg border border-asphalt-200 bg-white p-2.5 shadow-card sm:p-3", near)} data-testid={`tire-${tire.position}`}>
      <div className={cn("flex flex-col gap-1.5 sm:w-full sm:flex-row sm:items-center sm:justify-between", side === "left" ? "items-end sm:flex-row-reverse" : "items-start")}>
        <p className="text-base font-bold leading-tight sm:text-lg">{POSITION_LABELS[tire.position]}</p>
        {tire.condition ? <ConditionBadge condition={tire.condition} className="text-xs sm:text-sm" /> : <span className="text-sm text-asphalt-600">No reading</span>}
      </div>
      {/* The glyph sits on the axle's side of the station; the details on the outside. */}
      <div className={cn("flex flex-col gap-1.5 sm:w-full sm:gap-3", side === "left" ? "items-end sm:flex-row-reverse" : "items-start sm:flex-row")}>
        <figure className={cn("flex shrink-0 flex-col", side === "left" ? "items-end" : "items-start")}>
          <TireTreadProfile tire={tire} limitMm={limitMm} depthUnit={depthUnit} innerSide={innerSide} className="h-20 w-28 sm:h-24 sm:w-36" />
          <figcaption className="flex w-28 justify-between px-1 text-[0.6875rem] uppercase tracking-wide text-asphalt-500 sm:w-36" aria-hidden>
            <span>{innerSide === "left" ? "in" : "out"}</span>
            <span>{innerSide === "left" ? "out" : "in"}</span>
          </figcaption>
        </figure>
        <div className={cn("flex min-w-0 flex-col gap-1", near)}>
          <p className="text-sm text-asphalt-800">
            <span className="tabular-nums font-semibold">{tire.depthMm != null ? f.depth(tire.depthMm, depthUnit) : "—"}</span>{" "}
            <span className="text-asphalt-600">{tire.latest ? `checked ${f.date(tire.latest.checkedOn)}` : "no check yet"}</span>
          </p>
          <p className="break-words font-mono text-xs tracking-tight sm:text-sm sm:tracking-normal">{tire.dotCode ?? "No DOT code logged"}</p>
          <p className="text-xs text-asphalt-700 sm:text-sm">
            {dotWeek(tire)}
            {tire.age ? <span>{` · ${f.age(tire.age)}`}</span> : null}
          </p>
        </div>
      </div>
      {tire.pattern && tire.pattern.kind !== "even" ? <p className="text-xs text-asphalt-700 sm:text-sm">{tire.pattern.likelyCause}</p> : null}
      {measurable ? (
        <a href={`#check-${tire.position}`} className="inline-flex min-h-11 items-center rounded border border-groove-600 px-3 text-sm font-semibold text-groove-800 no-underline hover:bg-groove-50">
          Measure
        </a>
      ) : null}
    </div>
  );
}

// Shared by server and client components: depths need no zone, so the default formatter does.

/** `f` is the viewer's formatter (lib/format/server.ts): dates, ages and depths as the technician writes them. */
export function VehiclePlan({ tires, limitMm, depthUnit, measurable, f }: { tires: TireView[]; limitMm: number; depthUnit: DepthUnit; measurable: boolean; f: Formatter }) {
  const at = (p: string) => tires.find((t) => t.position === p);
  const extra = tires.filter((t) => !WHEELS.some((w) => w.position === t.position));
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-[minmax(0,1fr)_2.25rem_minmax(0,1fr)] gap-x-2 gap-y-4 sm:grid-cols-[minmax(0,1fr)_4rem_minmax(0,1fr)] sm:gap-x-3" aria-label="The tires at their wheels, front at the top" role="group">
        {/* The car's outline seen from above, front at the top, with its two axles. */}
        <div aria-hidden className="relative col-start-2 row-span-2 row-start-1 rounded-[1.25rem] border-2 border-asphalt-300 bg-asphalt-100">
          <ChevronUp className="absolute left-1/2 top-1 size-5 -translate-x-1/2 text-asphalt-500" />
          <span className="absolute -inset-x-4 top-1/4 h-1 -translate-y-1/2 rounded bg-asphalt-400 sm:-inset-x-5" />
          <span className="absolute -inset-x-4 top-3/4 h-1 -translate-y-1/2 rounded bg-asphalt-400 sm:-inset-x-5" />
          <span className="absolute inset-y-[25%] left-1/2 w-0.5 -translate-x-1/2 bg-asphalt-300" />
        </div>
        {WHEELS.map((w) => {
          const t = at(w.position);
          const place = cn(w.side === "left" ? "col-start-1" : "col-start-3", w.axle === "front" ? "row-start-1" : "row-start-2");
          return t ? (
            <div key={w.position} className={place}>
              <WheelStation tire={t} side={w.side} limitMm={limitMm} depthUnit={depthUnit} measurable={measurable} f={f} />
            </div>
          ) : (
            <p key={w.position} className={cn(place, "self-center rounded-lg border border-dashed border-asphalt-300 p-3 text-sm text-asphalt-600")}>
              {POSITION_LABELS[w.position]}: no tire logged
            </p>
          );
        })}
      </div>
      {extra.length ? (
        <div className="grid gap-3 sm:grid-cols-2">
          {extra.map((t) => (
            <WheelStation key={t.id} tire={t} side="right" limitMm={limitMm} depthUnit={depthUnit} measurable={measurable} f={f} />
          ))}
        </div>
      ) : null}
      <p className="text-xs text-asphalt-600">
        Each tire is drawn in cross-section: its inner, centre and outer grooves as bars against the dashed depth when new; the shaded band is below the set&apos;s limit of {f.depth(limitMm, depthUnit)}.
      </p>
    </div>
  );
}
