// Ada pays for Plus: a yearly subscription in the local Stripe fake, started
// two months ago, and the app's stored copy of it (what a checkout and its
// webhooks would have left). With a real Stripe key nothing is seeded and Ada
// is on Free until she buys Plus.
import { customerOf, rememberCustomer, storeSubscription } from "@/db/queries/billing";
import { seedPaidSubscription } from "@/lib/billing/fake/engine";
import { toStoredSubscription } from "@/lib/billing/service";
import { usingFakeStripe } from "@/lib/env";
import { demoAccounts } from "./demo-accounts";
import type { SeedContext } from "../seed";

export async function seedBilling({ ids }: SeedContext) {
  if (!usingFakeStripe()) return;
  // Loading the demo again keeps the subscription it made the first time.
  if (await customerOf({ userId: ids.ada })) return;
  const ada = demoAccounts.ada;
  const { customerId, subscription } = await seedPaidSubscription({ email: ada.email, name: ada.name, userId: ids.ada, interval: "year", startedDaysAgo: 60 });
  await rememberCustomer({ userId: ids.ada, stripeCustomerId: customerId });
  await storeSubscription({ sub: toStoredSubscription(subscription, { userId: ids.ada, describedAt: new Date() }) });
}
