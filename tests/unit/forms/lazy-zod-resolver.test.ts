// The lazily loaded resolver (lib/forms/lazy-zod-resolver.ts) answers as the
// zod resolver it stands in for: the same values on success, the same field
// errors on failure; the schema module is loaded once, and a failed load is
// tried again rather than remembered.
import { zodResolver } from "@hookform/resolvers/zod";
import type { FieldValues, ResolverOptions } from "react-hook-form";
import { describe, expect, it } from "vitest";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";
import { serviceEntryUpdateSchema } from "@/lib/validation/logbook";

const options = { fields: {}, shouldUseNativeValidation: false } as ResolverOptions<FieldValues>;
const valid = { kind: "rotation", setId: "", performedOn: "2024-05-02", odometer: "41300", odometerUnit: "km", confirmLowerOdometer: false, cost: "40", notes: "" };
const invalid = { ...valid, cost: "forty", odometer: "many" };

describe("lazyZodResolver", () => {
  it("gives the zod resolver's values and errors, loading the schema once", async () => {
    let loads = 0;
    const lazy = lazyZodResolver(async () => {
      loads += 1;
      return serviceEntryUpdateSchema;
    });
    const eager = zodResolver(serviceEntryUpdateSchema);
    for (const v of [valid, invalid]) {
      const [a, b] = await Promise.all([lazy(v as never, undefined, options as never), eager(v as never, undefined, options as never)]);
      expect(a).toEqual(b);
    }
    const bad = await lazy(invalid as never, undefined, options as never);
    expect(Object.keys(bad.errors).sort()).toEqual(["cost", "odometer"]);
    expect(loads).toBe(1);
  });

  it("tries a failed load again on the next check", async () => {
    let attempt = 0;
    const lazy = lazyZodResolver(async () => {
      attempt += 1;
      if (attempt === 1) throw new Error("chunk failed");
      return serviceEntryUpdateSchema;
    });
    await expect(lazy(valid as never, undefined, options as never)).rejects.toThrow("chunk failed");
    const ok = await lazy(valid as never, undefined, options as never);
    expect(ok.errors).toEqual({});
    expect(attempt).toBe(2);
  });
});
