import { describe, expect, it } from "vitest";
import { nextReminderOf } from "@/db/queries/logbook";
import type { ReminderItem } from "@/lib/tires";

const item = (id: string, date: string, severity: ReminderItem["severity"], overdue: boolean): ReminderItem => ({
  id,
  kind: "age-watch",
  vehicleId: "v",
  subject: id,
  date,
  severity,
  overdue,
  explanation: "",
});

describe("the one reminder a vehicle card shows", () => {
  const today = "2026-12-01";
  it("puts an overdue replace first", () => {
    const items = [item("watch-old", "2025-03-28", "watch", true), item("replace", "2026-01-10", "replace", true), item("soon", "2026-12-20", "info", false)];
    expect(nextReminderOf(items, today)?.id).toBe("replace");
  });
  it("then the most recent other overdue item, before anything upcoming", () => {
    const items = [item("watch-old", "2025-03-28", "watch", true), item("swap-missed", "2026-10-15", "watch", true), item("soon", "2026-12-20", "info", false)];
    expect(nextReminderOf(items, today)?.id).toBe("swap-missed");
  });
  it("else the soonest upcoming one", () => {
    const items = [item("later", "2027-05-01", "plan", false), item("soon", "2026-12-20", "info", false)];
    expect(nextReminderOf(items, today)?.id).toBe("soon");
    expect(nextReminderOf([], today)).toBeUndefined();
  });
});
