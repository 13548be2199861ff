// Loads the invented demo scenario. Dates are relative to `today`, so the
// conditions and reminders stay interesting whenever the demo is loaded.
import { seedAccounts, type DemoIds } from "./seed/accounts";
import { seedBilling } from "./seed/billing";
import { seedLogbook } from "./seed/logbook";
import { seedHousehold } from "./seed/household";
import { seedPasses } from "./seed/passes";
import { seedReminders } from "./seed/reminders";

export type SeedContext = { ids: DemoIds; today: string };

/** Each area of the product adds its part of the scenario here, in order. */
const parts: { name: string; run: (ctx: SeedContext) => Promise<void> }[] = [
  // Ada's Plus is a paid subscription in the local Stripe fake, not a column.
  { name: "billing", run: seedBilling },
  { name: "logbook", run: seedLogbook },
  // After the logbook part: it gives the shop passes to Ada's vehicles.
  { name: "passes", run: async (ctx) => void (await seedPasses(ctx)) },
  // Tomas co-keeps Ada's estate car.
  { name: "household", run: seedHousehold },
  // Last: it only sets the drivers' reminder settings.
  { name: "reminders", run: seedReminders },
];

export async function seedDemo({ today }: { today: string }): Promise<SeedContext> {
  const ids = await seedAccounts();
  const ctx = { ids, today };
  for (const part of parts) await part.run(ctx);
  return ctx;
}
