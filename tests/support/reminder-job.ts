// Child process for the reminder-job crash test: the daily e-mail run on a
// PGlite data folder, as the server's scheduler runs it (lib/reminders/run.ts),
// with the local e-mail fake's own store (idempotency keys included) as the
// provider. Modes:
//   seed-run <dir> <drivers> <nowISO> <hangAfter>
//       Plus drivers with e-mail reminders and logbooks with due reminders, then
//       one run that, after the hangAfter-th accepted message, stops before
//       recording it (the test kills it there with SIGKILL)
//   run <dir> <nowISO>
//       prints what is due for each driver at that time (JSON), then one whole run
process.env.FOURPATCH_DATA_DIR = process.argv[3];
process.env.BETTER_AUTH_URL = "http://fourpatch.test";
delete process.env.DATABASE_URL;
const [mode] = process.argv.slice(2);
const { db, migrateDb } = await import("@/db");
const { user, driverProfile } = await import("@/db/schema");
await migrateDb();
let now: Date;
let hangAfter = Infinity;

if (mode === "seed-run") {
  const { addVehicle, renwickStyleLogbook, setPlan } = await import("./logbook-fixtures");
  for (let i = 0; i < Number(process.argv[4]); i++) {
    const id = `reminder-driver-${i}`;
    await db.insert(user).values({ id, name: `Reminder Driver ${i}`, email: `reminder-driver-${i}@example.test`, emailVerified: true });
    await db.insert(driverProfile).values({ userId: id });
    await setPlan({ userId: id, plan: "plus", emailReminders: true, settings: { emailLeadDays: 14 } });
    await renwickStyleLogbook(id);
    // Made in week 13 of 2022: its four-year watch (late March 2026) comes due between the two runs.
    await addVehicle({ ownerId: id, nickname: "Grey van", sets: [{ label: "Drift winter", kind: "winter", state: "stored", dotCode: "1322" }] });
  }
  now = new Date(process.argv[5]);
  hangAfter = Number(process.argv[6]);
} else {
  const { computeFor, driversForDelivery, reminderProfile } = await import("@/db/queries/reminders");
  const { todayIn } = await import("@/lib/reminders/describe");
  const { addDays } = await import("@/lib/tires");
  now = new Date(process.argv[4]);
  const due: Record<string, string[]> = {};
  for (const userId of await driversForDelivery()) {
    const profile = (await reminderProfile({ userId }))!;
    const today = todayIn(profile.timezone, now);
    const { items } = await computeFor({ profile, today });
    const lead = profile.settings.emailLeadDays;
    due[profile.email] = items.filter((i) => addDays(i.date, -lead) <= today && i.date >= addDays(today, -180)).map((i) => i.subject);
  }
  process.stdout.write(`due ${JSON.stringify(due)}\n`);
}

const { runReminderDeliveries } = await import("@/lib/reminders/run");
const { storeFakeEmail } = await import("@/db/queries/outbox");
const { render } = await import("@react-email/render");
let accepted = 0;
const summary = await runReminderDeliveries({
  now,
  send: async (input) => {
    const [html, text] = await Promise.all([render(input.react), render(input.react, { plainText: true })]);
    const id = await storeFakeEmail({
      idempotencyKey: input.idempotencyKey,
      message: { from: "Fourpatch <reminders@fourpatch.test>", to: [input.to as string], subject: input.subject, html, text, tags: [{ name: "kind", value: input.kind }] },
    });
    accepted += 1;
    process.stdout.write(`sent ${accepted}\n`);
    // The provider has the message; the run has not yet recorded it. The worst moment to die.
    if (accepted >= hangAfter) await new Promise(() => {});
    return { ok: true, id };
  },
});
process.stdout.write(`done ${JSON.stringify(summary)}\n`);
process.exit(0);
export {};
