// Child process for the crash-durability test: a real HTTP server on a PGlite
// data folder that writes through the app's own queries (a vehicle, then a
// set of four tires in one transaction) and answers only after the commit.
// The test kills it with SIGKILL mid-load and opens the folder again.
import http from "node:http";

process.env.FOURPATCH_DATA_DIR = process.argv[2];
process.env.FOURPATCH_EMAIL_DELIVERY = "skip";
delete process.env.DATABASE_URL;
const { db, migrateDb } = await import("@/db");
const { user } = await import("@/db/schema");
const { createVehicle } = await import("@/db/queries/vehicles");
const { createSetWithTires } = await import("@/db/queries/sets");
const { setPurchaseSchema, vehicleSchema } = await import("@/lib/validation/logbook");

await migrateDb();
const userId = "crash-test-driver";
await db.insert(user).values({ id: userId, name: "Crash Driver", email: "crash@example.test", emailVerified: true }).onConflictDoNothing();
const access = { kind: "owner", userId, userName: "Crash Driver" } as const;

const server = http.createServer((req, res) => {
  let body = "";
  req.on("data", (c) => (body += c));
  req.on("end", async () => {
    try {
      const { tag } = JSON.parse(body) as { tag: string };
      const v = await createVehicle({ userId, input: vehicleSchema.parse({ nickname: tag, make: "Velora", model: "Strand", odometerUnit: "km", pressureUnit: "kpa" }) });
      await createSetWithTires({
        access,
        vehicleId: v.id,
        input: setPurchaseSchema.parse({
          kind: "summer",
          size: "205/55R16",
          label: tag,
          mountNow: true,
          tires: (["front_left", "front_right", "rear_left", "rear_right"] as const).map((position) => ({ position, dotCode: "DOT XJ7K ABCD 1224", newDepth: "8" })),
        }),
      });
      res.writeHead(201).end(JSON.stringify({ tag }));
    } catch (err) {
      res.writeHead(500).end(String(err));
    }
  });
});
server.listen(0, "127.0.0.1", () => {
  const addr = server.address();
  process.stdout.write(`listening ${typeof addr === "object" && addr ? addr.port : 0}\n`);
});
