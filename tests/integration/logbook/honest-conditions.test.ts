// Issue 10 items 3, 4 and 7 through the real route handlers: a tire without a
// DOT code is never "good", its code can be added later, advice never
// contradicts the condition, and tread that "grows back" is asked about.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { tire } from "@/db/schema";
import { GET as getVehicle } from "@/app/api/vehicles/[vehicleId]/route";
import { POST as createCheck } from "@/app/api/vehicles/[vehicleId]/checks/route";
import { PATCH as patchTire } from "@/app/api/tires/[tireId]/route";
import type { VehicleLogbook } from "@/db/queries/logbook";
import { ctx, request, signUp, type TestUser } from "../../support/users";
import { dotCodeDaysAgo, makeSet, makeVehicle } from "./fixtures";

const noCodes = (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({ position, newDepth: "8" }));

async function book(as: TestUser, vehicleId: string) {
  const res = await getVehicle(request(`/api/vehicles/${vehicleId}`, { as }), ctx({ vehicleId }));
  expect(res.status).toBe(200);
  return (await res.json()) as VehicleLogbook;
}
const check = (as: TestUser, vehicleId: string, body: unknown) => createCheck(request(`/api/vehicles/${vehicleId}/checks`, { as, body }), ctx({ vehicleId }));
const patch = (as: TestUser | undefined, tireId: string, body: unknown) => patchTire(request(`/api/tires/${tireId}`, { as, body, method: "PATCH" }), ctx({ tireId }));

describe("a tire whose age is unknown", () => {
  it("is 'unknown', never 'good', even with new tread; the set shows it too", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    await makeSet(ada, vehicleId, { tires: noCodes });
    const b = await book(ada, vehicleId);
    const set = b.sets[0];
    expect(set.tires.map((t) => t.condition)).toEqual(["unknown", "unknown", "unknown", "unknown"]);
    expect(set.condition).toBe("unknown");
    // With a code, the same new tires are good: the difference is the code alone.
    const other = await makeVehicle(ada, { nickname: "Second" });
    await makeSet(ada, other, { tires: noCodes.map((t) => ({ ...t, dotCode: `DOT 3QXY ABC ${dotCodeDaysAgo(200)}` })) });
    expect((await book(ada, other)).sets[0].condition).toBe("good");
  });

  it("gets its DOT code later from its owner; a stranger gets 404, a bad code 422 naming the field", async () => {
    const ada = await signUp();
    const stranger = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId, { tires: noCodes });
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    const fl = tires.find((t) => t.position === "front_left")!;
    const code = `DOT 3QXY ABC ${dotCodeDaysAgo(200)}`;

    expect((await patch(stranger, fl.id, { dotCode: code, position: "front_left" })).status).toBe(404);
    expect((await patch(undefined, fl.id, { dotCode: code, position: "front_left" })).status).toBe(401);
    const bad = await patch(ada, fl.id, { dotCode: "DOT 3QXY ABC 5724", position: "front_left" });
    expect(bad.status).toBe(422);
    expect(((await bad.json()) as { error: { fields: Record<string, string[]> } }).error.fields.dotCode[0]).toMatch(/week/);
    expect((await db.select().from(tire).where(eq(tire.id, fl.id)))[0].dotCode).toBeNull();

    const ok = await patch(ada, fl.id, { dotCode: code, position: "front_left" });
    expect(ok.status).toBe(200);
    const after = (await book(ada, vehicleId)).sets[0].tires.find((t) => t.id === fl.id)!;
    expect(after.dotCode).toBe(code);
    expect(after.condition).toBe("good");
    expect(after.age).not.toBeNull();
  });

  it("moving a tire to a taken position swaps the two, as a rotation does", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId, { tires: noCodes });
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    const fl = tires.find((t) => t.position === "front_left")!;
    const rr = tires.find((t) => t.position === "rear_right")!;
    expect((await patch(ada, fl.id, { position: "rear_right" })).status).toBe(200);
    const now = await db.select().from(tire).where(eq(tire.setId, setId));
    expect(now.find((t) => t.id === fl.id)!.position).toBe("rear_right");
    expect(now.find((t) => t.id === rr.id)!.position).toBe("front_left");
    expect(new Set(now.map((t) => t.position)).size).toBe(4);
  });
});

describe("advice and readings that contradict the tire", () => {
  it("an evenly worn tire at 0.5 mm is 'replace', and its advice says so instead of 'nothing to do'", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId);
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    const res = await check(ada, vehicleId, { setId, readings: tires.map((t) => ({ tireId: t.id, inner: "0.5", centre: "0.5", outer: "0.5" })) });
    expect(res.status).toBe(201);
    const t = (await book(ada, vehicleId)).sets[0].tires[0];
    // 0.5 mm is under the EU minimum of 1.6 mm (Directive 89/459/EEC) [pub].
    expect(t.condition).toBe("replace");
    expect(t.pattern?.kind).toBe("even");
    expect(t.pattern?.advice).not.toMatch(/nothing to do/i);
    expect(t.pattern?.advice).toMatch(/replace/i);
  });

  it("a reading deeper than the tire was new asks first (409 naming the tire), then saves when confirmed", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId); // new depth 8 mm
    const tires = await db.select().from(tire).where(eq(tire.setId, setId));
    const body = { setId, readings: [{ tireId: tires[0].id, inner: "12", centre: "12", outer: "12" }] };
    const res = await check(ada, vehicleId, body);
    expect(res.status).toBe(409);
    const err = ((await res.json()) as { error: { fields: Record<string, string[]> } }).error;
    expect(err.fields["readings.0.centre"][0]).toMatch(/deeper than the tire was new/);
    expect(err.fields.confirmUnusualDepth).toBeDefined();
    // 8.4 mm is within the gauge slack of 8 mm new: saved without a question.
    expect((await check(ada, vehicleId, { setId, readings: [{ tireId: tires[1].id, centre: "8.4" }] })).status).toBe(201);
    expect((await check(ada, vehicleId, { ...body, confirmUnusualDepth: true })).status).toBe(201);
  });

  it("a big jump up from the last reading asks first; a small one does not", async () => {
    const ada = await signUp();
    const vehicleId = await makeVehicle(ada);
    const { setId } = await makeSet(ada, vehicleId, { tires: noCodes.map((t) => ({ position: t.position })) }); // no new depth logged
    const [t] = await db.select().from(tire).where(eq(tire.setId, setId));
    expect((await check(ada, vehicleId, { setId, readings: [{ tireId: t.id, centre: "4" }] })).status).toBe(201);
    expect((await check(ada, vehicleId, { setId, readings: [{ tireId: t.id, centre: "4.8" }] })).status).toBe(201);
    const jump = await check(ada, vehicleId, { setId, readings: [{ tireId: t.id, centre: "7" }] });
    expect(jump.status).toBe(409);
    expect(((await jump.json()) as { error: { fields: Record<string, string[]> } }).error.fields["readings.0.centre"][0]).toMatch(/deeper than the last reading/);
  });
});
