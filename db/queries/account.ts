import "server-only";
// A driver's right to delete all of their data (the export is db/queries/export.ts).
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { attachment, member, organization, user, vehicle } from "@/db/schema";
import { AppError } from "@/lib/errors";

/**
 * Deletes an account and everything that belongs to it, in one transaction
 * (foreign keys cascade from the user row). Returns the stored names of the
 * uploaded files, which the caller removes from disk after the commit.
 */
export async function deleteAccount({ userId }: { userId: string }): Promise<{ storedFiles: string[] }> {
  return db.transaction(async (tx) => {
    const owned = await tx
      .select({ name: organization.name })
      .from(member)
      .innerJoin(organization, eq(member.organizationId, organization.id))
      .where(and(eq(member.userId, userId), eq(member.role, "owner")));
    if (owned.length > 0) {
      throw new AppError(
        "conflict",
        `This account owns the shop ${owned.map((o) => o.name).join(", ")}. Hand the shop to another owner or close it before deleting the account.`,
      );
    }
    const files = await tx
      .select({ storedName: attachment.storedName })
      .from(attachment)
      .innerJoin(vehicle, eq(attachment.vehicleId, vehicle.id))
      .where(eq(vehicle.ownerId, userId));
    const deleted = await tx.delete(user).where(eq(user.id, userId)).returning({ id: user.id });
    if (deleted.length !== 1) throw new AppError("not_found", "That account was not found.");
    return { storedFiles: files.map((f) => f.storedName) };
  });
}
