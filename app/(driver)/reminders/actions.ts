"use server";
// The reminders page's actions. The feed secret is shown once, right after
// it is made: only its hash is stored, so it cannot be shown again later.
import { revalidatePath } from "next/cache";
import QRCode from "qrcode";
import { z } from "zod";
import { regenerateFeed, revokeFeed } from "@/db/queries/reminders";
import { action } from "@/lib/actions";
import { appUrl } from "@/lib/env";
import { saveSettingsFor } from "@/lib/reminders/settings";
import { feedUrls } from "@/lib/reminders/token";
import { reminderSettingsFormSchema } from "@/lib/validation/reminders";

export type NewFeed = { https: string; webcal: string; qrSvg: string };

export const createFeedLink = action(z.object({}), {}, async (_input, { session }): Promise<NewFeed> => {
  const token = await regenerateFeed({ userId: session.user.id });
  const urls = feedUrls(token, appUrl());
  // The QR code holds the webcal:// address: a phone's camera offers to subscribe.
  const qrSvg = await QRCode.toString(urls.webcal, { type: "svg", errorCorrectionLevel: "M", margin: 1, color: { dark: "#14181dff", light: "#ffffffff" } });
  return { ...urls, qrSvg };
});

export const turnOffFeed = action(z.object({}), {}, async (_input, { session }) => {
  await revokeFeed({ userId: session.user.id });
  revalidatePath("/reminders");
  return null;
});

export const saveReminderSettingsAction = action(reminderSettingsFormSchema, {}, async (input, { session }) => {
  const saved = await saveSettingsFor({ userId: session.user.id, input });
  revalidatePath("/reminders");
  return { emailActive: saved.emailActive };
});
