// Child process for the backup test: `write <dir> <nickname>…` adds vehicles
// (and an uploaded file) to the PGlite folder; `list <dir>` prints the nicknames.
import fs from "node:fs";
import path from "node:path";

const [cmd, dir, ...tags] = process.argv.slice(2);
process.env.FOURPATCH_DATA_DIR = dir;
process.env.FOURPATCH_EMAIL_DELIVERY = "skip";
delete process.env.DATABASE_URL;
const { db, migrateDb, closeDb } = await import("@/db");
const { user, vehicle } = await import("@/db/schema");
await migrateDb();
if (cmd === "write") {
  await db.insert(user).values({ id: "probe-driver", name: "Probe Driver", email: "probe@example.test", emailVerified: true }).onConflictDoNothing();
  for (const tag of tags) {
    await db.insert(vehicle).values({ ownerId: "probe-driver", nickname: tag, make: "Velora", model: "Strand" });
    fs.mkdirSync(path.join(dir, "uploads"), { recursive: true });
    fs.writeFileSync(path.join(dir, "uploads", `${tag}.txt`), tag);
  }
} else {
  const rows = await db.select({ nickname: vehicle.nickname }).from(vehicle);
  const files = fs.existsSync(path.join(dir, "uploads")) ? fs.readdirSync(path.join(dir, "uploads")).sort() : [];
  process.stdout.write(`${JSON.stringify({ vehicles: rows.map((r) => r.nickname).sort(), files })}\n`);
}
await closeDb();
