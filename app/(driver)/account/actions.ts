"use server";
import { revalidatePath } from "next/cache";
import { setUnits } from "@/db/queries/logbook";
import { action } from "@/lib/actions";
import { unitsSchema } from "@/lib/validation/logbook";

export const saveUnits = action(unitsSchema, {}, async (input, { session }) => {
  const r = await setUnits({ userId: session.user.id, ...input });
  revalidatePath("/vehicles", "layout");
  return r;
});
