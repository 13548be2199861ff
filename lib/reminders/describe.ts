// Words around a computed reminder: what to do, where to look, and the date
// "today" in the driver's own time zone.
import type { ReminderItem, ReminderKind } from "@/lib/tires";

const TODO: Record<ReminderKind, string> = {
  "age-watch": "Have the tires inspected by a tire technician, and again every year from now on.",
  "age-replace": "Plan new tires: book a fitting and log the new set in Fourpatch.",
  "depth-limit": "Measure the tread again (inner, centre and outer grooves) and plan new tires if the reading confirms it.",
  "seasonal-swap": "Book the seasonal change with your shop, or swap the sets yourself, and log it.",
  "rotation-due": "Have the tires rotated and log the rotation with the odometer reading.",
};

export function whatToDo(kind: ReminderKind): string {
  return TODO[kind];
}

export function logbookPath(item: Pick<ReminderItem, "vehicleId" | "setId">): string {
  return item.setId ? `/sets/${item.setId}` : `/vehicles/${item.vehicleId}`;
}

export function vehiclePath(item: Pick<ReminderItem, "vehicleId">): string {
  return `/vehicles/${item.vehicleId}`;
}

/** Today's calendar date where the driver lives; an unknown zone falls back to UTC. */
export function todayIn(timeZone: string, now: Date): string {
  try {
    return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(now);
  } catch {
    return now.toISOString().slice(0, 10);
  }
}

export function isValidTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat("en-CA", { timeZone });
    return true;
  } catch {
    return false;
  }
}
