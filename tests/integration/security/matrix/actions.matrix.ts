// Server actions, called as each actor. matrix.test.ts stands in for Next's
// request scope (next/headers) with the actor's cookie.
import { setAccountDisabled } from "@/app/(admin)/admin/actions";
import { saveUnits } from "@/app/(driver)/account/actions";
import { createFeedLink, saveReminderSettingsAction, turnOffFeed } from "@/app/(driver)/reminders/actions";
import { changeSubscription } from "@/app/unsubscribe/[token]/actions";
import { signUp } from "../../../support/users";
import { asActor, outcome } from "./act";
import { anySignedIn, everyone, type MatrixEntry } from "./types";

export const entries: MatrixEntry[] = [
  { file: "app/(driver)/account/actions.ts", exportName: "saveUnits", what: "save one's own units", expect: anySignedIn(200),
    call: (w, a) => asActor(w, a, async () => outcome(await saveUnits({ units: "metric", pressureUnit: "kpa" }))) },
  { file: "app/(driver)/reminders/actions.ts", exportName: "createFeedLink", what: "make one's own feed link", expect: anySignedIn(200),
    call: (w, a) => asActor(w, a, async () => outcome(await createFeedLink({}))) },
  { file: "app/(driver)/reminders/actions.ts", exportName: "turnOffFeed", what: "turn one's own feed off", expect: anySignedIn(200),
    call: (w, a) => asActor(w, a, async () => outcome(await turnOffFeed({}))) },
  { file: "app/(driver)/reminders/actions.ts", exportName: "saveReminderSettingsAction", what: "save one's own reminder settings", expect: anySignedIn(200),
    call: (w, a) =>
      asActor(w, a, async () =>
        outcome(await saveReminderSettingsAction({ jurisdiction: "EU", kinds: ["age-replace"], alarmLeadDays: [], emailLeadDays: "14", autumnSwap: "10-15", springSwap: "04-15", rotationIntervalKm: "10000", emailReminders: false, timezone: "Europe/Oslo" } as never)),
      ) },
  { file: "app/(admin)/admin/actions.ts", exportName: "setAccountDisabled", what: "disable a throw-away account", expect: { operator: 200, signedOut: 401, others: 403 },
    call: async (w, a) => {
      const target = await signUp({ name: `Target of ${a}` });
      return asActor(w, a, async () => outcome(await setAccountDisabled({ userId: target.id, disable: "true" } as never)));
    } },
  { file: "app/unsubscribe/[token]/actions.ts", exportName: "changeSubscription", what: "change a subscription with a forged token", expect: everyone(404),
    call: (w, a) =>
      asActor(w, a, async () => {
        const f = new FormData();
        f.set("token", "e30.forged");
        f.set("choice", "unsubscribe");
        const r = await changeSubscription({ status: "idle" }, f);
        return { status: r.status === "invalid" ? 404 : 200 };
      }) },
];
