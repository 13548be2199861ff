// The demo scenario says what it promises, whatever day it is loaded: the
// seed is dated relative to `today`, so these checks run against today.
import { describe, expect, it } from "vitest";
import { seedDemo } from "@/db/seed";
import { DEMO_VEHICLES, demoVehicleId } from "@/db/seed/logbook";
import { getVehicleLogbook, listVehicleSummaries } from "@/db/queries/logbook";
import { todayIso } from "@/lib/validation/logbook";

describe("demo logbook", () => {
  it("Ada's car: summer set on it with an inner-shoulder tire, winter set stored at the shop in 'plan' by age", async () => {
    const today = todayIso();
    const { ids } = await seedDemo({ today });
    const carId = (await demoVehicleId(ids.ada, DEMO_VEHICLES.adaCar))!;
    const book = await getVehicleLogbook({ access: { kind: "owner", userId: ids.ada, userName: "Ada Renwick" }, vehicleId: carId, today });

    const summer = book.sets.find((s) => s.kind === "summer")!;
    const winter = book.sets.find((s) => s.kind === "winter")!;
    expect(summer.state).toBe("mounted");
    expect(winter).toMatchObject({ state: "stored", storageLocation: "Quillby Tread Works" });

    const fl = summer.tires.find((t) => t.position === "front_left")!;
    expect(fl.pattern?.kind).toBe("inner-shoulder");
    // 3.3 mm is within 2 mm of the 1.6 mm EU minimum: "watch" by the margins of lib/tires [practice].
    expect(fl.depthLevel).toBe("watch");
    expect(fl.projection?.method).toBe("least-squares");
    expect(summer.tires.filter((t) => t.position !== "front_left").every((t) => t.pattern?.kind === "even")).toBe(true);

    // Made 5 years 8 months ago; winter tires are replaced at 6 years, planned 6 months before [practice, trade-facts §3].
    expect(winter.tires.every((t) => t.ageLevel === "plan")).toBe(true);
    expect(winter.condition).toBe("plan");

    // Ten months of checks on the summer set, one by the shop.
    const summerChecks = book.checks.filter((c) => c.setId === summer.id);
    expect(summerChecks.length).toBeGreaterThanOrEqual(6);
    expect(summerChecks.some((c) => c.measuredBy === "shop" && c.shopName === "Quillby Tread Works")).toBe(true);
    const spanDays = (Date.parse(summerChecks[0].checkedOn) - Date.parse(summerChecks.at(-1)!.checkedOn)) / 86_400_000;
    expect(spanDays).toBeGreaterThan(290);
    expect(book.odometer.length).toBeGreaterThan(10);
    expect(book.attachments.map((a) => a.mimeType)).toEqual(["application/pdf"]);
  });

  it("the vehicles overview shows a next reminder and a condition for each of Ada's vehicles, and loading twice adds nothing", async () => {
    const today = todayIso();
    const { ids } = await seedDemo({ today });
    const overview = await listVehicleSummaries({ userId: ids.ada, today });
    expect(overview.vehicles.map((v) => v.nickname)).toEqual([DEMO_VEHICLES.adaCar, DEMO_VEHICLES.adaVan]);
    for (const v of overview.vehicles) {
      expect(v.mountedSet?.condition).toBeTruthy();
      expect(v.nextReminder?.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
      expect(v.lastCheck).not.toBeNull();
      // What the overview's tread-profile glyphs draw: each tire's latest grooves against the set's limit.
      expect(v.mountedSet?.tires.map((t) => t.position).sort()).toEqual(["front_left", "front_right", "rear_left", "rear_right"]);
      expect(v.mountedSet?.tires.every((t) => t.latest && t.latest.innerMm != null && t.latest.centreMm != null && t.latest.outerMm != null)).toBe(true);
      expect(v.mountedSet?.limitMm).toBeGreaterThan(0);
    }
    // The demo car's front left wears on its inner shoulder: its inner groove is the shallowest.
    const fl = overview.vehicles[0].mountedSet?.tires.find((t) => t.position === "front_left")?.latest;
    expect(fl!.innerMm!).toBeLessThan(Math.min(fl!.centreMm!, fl!.outerMm!));
    // The van's all-season set is past 5 years: "watch" by age [practice, trade-facts §3].
    expect(overview.vehicles[1].mountedSet?.condition).toBe("watch");
    // Tomas has his own car and co-keeps Ada's estate car (db/seed/household.ts).
    const tomas = await listVehicleSummaries({ userId: ids.tomas, today });
    expect(tomas.vehicles.map((v) => [v.nickname, v.keptWith])).toEqual([
      [DEMO_VEHICLES.adaCar, "Ada Renwick"],
      [DEMO_VEHICLES.tomasCar, null],
    ]);
  });
});
