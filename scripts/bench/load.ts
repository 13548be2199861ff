// Loads a data folder for `npm run bench`: the demo, then (for the large
// size) the large data set, generated inside the database with
// generate_series so 1.2 M groove readings load in about a minute. Every row
// goes through the product's tables (its migrations, constraints and
// indexes). Prints the ids the load generator needs as one JSON line.
// Usage: FOURPATCH_DATA_DIR=… tsx scripts/bench/load.ts demo|large <out.json>
import fs from "node:fs";
process.env.FOURPATCH_EMAIL_DELIVERY ??= "skip";
const size = process.argv[2] === "large" ? "large" : "demo";
const outFile = process.argv[3];
const { closeDb, db, migrateDb } = await import("@/db");
const { seedDemo } = await import("@/db/seed");
const { demoAccounts } = await import("@/db/seed/accounts");
const { hashFeedToken, newFeedToken } = await import("@/lib/reminders/token");
const { sql } = await import("drizzle-orm");

type Row = Record<string, unknown>;
const q = async <T = Row>(text: string): Promise<T[]> => (await db.execute(sql.raw(text))).rows as T[];
const t0 = Date.now();
const step = (what: string) => console.error(`[load ${size}] ${what} (${((Date.now() - t0) / 1000).toFixed(1)} s)`);

try {
  await migrateDb();
  const today = process.env.FOURPATCH_TODAY ?? new Date().toISOString().slice(0, 10);
  await seedDemo({ today });
  step("demo");
  const [ada] = await q<{ id: string }>(`select id from "user" where email = '${demoAccounts.ada.email}'`);
  const [adaPw] = await q<{ password: string }>(`select password from account where user_id = '${ada.id}' and provider_id = 'credential'`);
  const pw = adaPw.password.replace(/'/g, "''");

  if (size === "large") {
    // Bulk-load the usual way: the rows are consistent by construction, so
    // foreign-key triggers are off for this session (replica role) and the
    // secondary indexes of the two biggest tables are rebuilt once at the end
    // from their own definitions (the migration's), not updated row by row.
    await q(`set session_replication_role = replica`);
    const deferred = await q<{ indexdef: string; indexname: string }>(
      `select indexname, indexdef from pg_indexes where schemaname = 'public' and tablename in ('tread_reading', 'tread_check')
       and indexname not in (select conname from pg_constraint)`,
    );
    for (const d of deferred) await q(`drop index "${d.indexname}"`);
    // 2,000 drivers (+1 with the ten-year car), 200 shops with one technician each.
    await q(`insert into "user" (id, name, email, email_verified, created_at, updated_at)
      select 'bench_d' || g, 'Bench Driver ' || g, 'driver' || g || '@bench.test', true, now(), now() from generate_series(1, 2001) g`);
    await q(`insert into "user" (id, name, email, email_verified, created_at, updated_at)
      select 'bench_t' || g, 'Bench Technician ' || g, 'tech' || g || '@bench.test', true, now(), now() from generate_series(1, 200) g`);
    await q(`insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at)
      select 'bench_acc_' || id, id, 'credential', id, '${pw}', now(), now() from "user" where id like 'bench_%'`);
    await q(`insert into driver_profile (user_id) select id from "user" where id like 'bench_d%' on conflict do nothing`);
    await q(`insert into organization (id, name, slug, created_at) select 'bench_shop' || g, 'Bench Shop ' || g, 'bench-shop-' || g, now() from generate_series(1, 200) g`);
    await q(`insert into shop_profile (shop_id, town) select 'bench_shop' || g, 'Benchton ' || (g % 40) from generate_series(1, 200) g`);
    await q(`insert into member (id, organization_id, user_id, role, created_at) select 'bench_m' || g, 'bench_shop' || g, 'bench_t' || g, 'owner', now() from generate_series(1, 200) g`);
    step("accounts and shops");

    // 4,000 vehicles, two per driver; each with a mounted, a stored and a retired set of four tires (48,000 tires).
    await q(`insert into vehicle (id, owner_id, nickname, make, model, year, odometer_unit)
      select md5('veh' || g)::uuid, 'bench_d' || ((g - 1) / 2 + 1), 'Bench car ' || g, 'Benchmark', 'Model ' || (g % 9), 2012 + g % 12, 'km' from generate_series(1, 4000) g`);
    await q(`insert into tire_set (id, vehicle_id, kind, size, state, purchased_on)
      select md5('set' || g || '-' || s)::uuid, md5('veh' || g)::uuid,
        (case s when 0 then 'summer' when 1 then 'winter' else 'all_season' end)::set_kind, '205/55R16',
        (case s when 0 then 'mounted' when 1 then 'stored' else 'retired' end)::set_state, date '${today}' - (s * 900 + 200)
      from generate_series(1, 4000) g, generate_series(0, 2) s`);
    await q(`insert into tire (id, set_id, position, dot_code, dot_week, dot_year, new_depth_mm)
      select md5('tire' || g || '-' || s || '-' || p)::uuid, md5('set' || g || '-' || s)::uuid,
        (array['front_left','front_right','rear_left','rear_right'])[p + 1]::tire_position,
        'DOT BX9 ' || lpad(((g + p) % 52 + 1)::text, 2, '0') || lpad((18 + s)::text, 2, '0'), (g + p) % 52 + 1, 2018 + s, 8
      from generate_series(1, 4000) g, generate_series(0, 2) s, generate_series(0, 3) p`);
    step("vehicles, sets, tires");

    // 300,000 checks (75 per vehicle, alternating between the mounted and the stored set), four readings each: 1.2 M readings.
    await q(`insert into tread_check (id, vehicle_id, set_id, checked_on, odometer_km, measured_by, method)
      select md5('chk' || g || '-' || c)::uuid, md5('veh' || g)::uuid, md5('set' || g || '-' || (c % 2))::uuid,
        date '${today}' - (75 - c) * 30, 20000 + c * 900, 'driver', 'gauge'
      from generate_series(1, 4000) g, generate_series(1, 75) c`);
    step("checks");
    for (let part = 0; part < 4; part++) {
      await q(`insert into tread_reading (check_id, tire_id, inner_mm, centre_mm, outer_mm)
        select md5('chk' || g || '-' || c)::uuid, md5('tire' || g || '-' || (c % 2) || '-' || p)::uuid,
          8 - c * 0.07, 8 - c * 0.07 + 0.1, 8 - c * 0.07 - 0.1
        from generate_series(${part * 1000 + 1}, ${(part + 1) * 1000}) g, generate_series(1, 75) c, generate_series(0, 3) p`);
      // PGlite never checkpoints by itself: keep the write-ahead log small while loading.
      await q(`checkpoint`);
      step(`readings ${part + 1}/4`);
    }
    await q(`insert into service_entry (vehicle_id, set_id, kind, performed_on, odometer_km)
      select md5('veh' || g)::uuid, md5('set' || g || '-' || s)::uuid, 'seasonal_swap', date '${today}' - (s + 1) * 180, 60000 + s * 5000
      from generate_series(1, 4000) g, generate_series(0, 1) s`);

    // The ten-year car: weekly checks for ten years (520 checks) on driver 2001.
    await q(`insert into vehicle (id, owner_id, nickname, make, model, year) values (md5('bigcar')::uuid, 'bench_d2001', 'Ten-year car', 'Benchmark', 'Long', 2016)`);
    await q(`insert into tire_set (id, vehicle_id, kind, size, state) values (md5('bigset')::uuid, md5('bigcar')::uuid, 'all_season', '205/55R16', 'mounted')`);
    await q(`insert into tire (id, set_id, position, dot_code, new_depth_mm)
      select md5('bigtire' || p)::uuid, md5('bigset')::uuid, (array['front_left','front_right','rear_left','rear_right'])[p + 1]::tire_position, 'DOT BX9 1216', 9 from generate_series(0, 3) p`);
    await q(`insert into tread_check (id, vehicle_id, set_id, checked_on, odometer_km)
      select md5('bigchk' || c)::uuid, md5('bigcar')::uuid, md5('bigset')::uuid, date '${today}' - (520 - c) * 7, 1000 + c * 300 from generate_series(1, 520) c`);
    await q(`insert into tread_reading (check_id, tire_id, inner_mm, centre_mm, outer_mm)
      select md5('bigchk' || c)::uuid, md5('bigtire' || p)::uuid, 9 - c * 0.012, 9 - c * 0.012, 9 - c * 0.012 from generate_series(1, 520) c, generate_series(0, 3) p`);
    step("ten-year car");

    // 5,000 active passes: 500 of them to the demo shop (the big pass list), the rest spread over the bench shops.
    await q(`insert into shop_pass (id, driver_id, shop_id, scope, starts_at, ends_at)
      select md5('pass' || g)::uuid, 'bench_d' || ((g - 1) % 2000 + 1),
        case when g <= 500 then 'shop_quillby_tread_works' else 'bench_shop' || (g % 200 + 1) end,
        'view_add', now() - interval '1 day', now() + ((g % 20) + 1) * interval '1 day'
      from generate_series(1, 5000) g`);
    // Ended passes: the history the "still visible" filter must skip.
    await q(`insert into shop_pass (id, driver_id, shop_id, scope, starts_at, ends_at, end_notice_sent_at)
      select md5('oldpass' || g)::uuid, 'bench_d' || ((g - 1) % 2000 + 1),
        case when g <= 5000 then 'shop_quillby_tread_works' else 'bench_shop' || (g % 200 + 1) end,
        'view', now() - (g % 700 + 10) * interval '1 day', now() - (g % 700 + 9) * interval '1 day', now()
      from generate_series(1, 20000) g`);
    await q(`insert into shop_pass_vehicle (pass_id, vehicle_id)
      select md5('pass' || g)::uuid, md5('veh' || (((g - 1) % 2000) * 2 + 1))::uuid from generate_series(1, 5000) g`);
    await q(`insert into shop_pass_vehicle (pass_id, vehicle_id)
      select md5('oldpass' || g)::uuid, md5('veh' || (((g - 1) % 2000) * 2 + 2))::uuid from generate_series(1, 20000) g`);
    // Some access history under the ended passes.
    await q(`insert into access_log (pass_id, vehicle_id, shop_id, actor_user_id, actor_name, action, at)
      select md5('oldpass' || g)::uuid, md5('veh' || (((g - 1) % 2000) * 2 + 2))::uuid,
        case when g <= 5000 then 'shop_quillby_tread_works' else 'bench_shop' || (g % 200 + 1) end,
        null, 'Bench Technician', 'read_logbook', now() - (g % 700 + 10) * interval '1 day'
      from generate_series(1, 20000) g, generate_series(1, 3) k`);
    step("passes and access log");
    for (const d of deferred) await q(d.indexdef);
    await q(`set session_replication_role = origin`);
    step(`rebuilt ${deferred.length} indexes`);
  }

  // A calendar feed for Ada, with a known secret.
  const feedToken = newFeedToken();
  await q(`update reminder_feed set revoked_at = now() where user_id = '${ada.id}' and revoked_at is null`);
  await q(`insert into reminder_feed (user_id, token_hash) values ('${ada.id}', '${hashFeedToken(feedToken)}')`);

  // What the product does after a bulk change (absent before the statistics work).
  const maintenance = await import("@/db/maintenance").catch(() => null);
  if (maintenance) {
    await maintenance.afterBulkChange();
    step("ANALYZE and CHECKPOINT");
  }

  const [adaCar] = await q<{ id: string }>(`select id from vehicle where owner_id = '${ada.id}' order by created_at limit 1`);
  const [adaSet] = await q<{ id: string }>(`select id from tire_set where vehicle_id = '${adaCar.id}' and state = 'mounted' limit 1`);
  const adaTires = await q<{ id: string }>(`select id from tire where set_id = '${adaSet.id}' order by position`);
  const [pass] = await q<{ pass_id: string; vehicle_id: string }>(
    `select spv.pass_id, spv.vehicle_id from shop_pass sp join shop_pass_vehicle spv on spv.pass_id = sp.id
     where sp.shop_id = 'shop_quillby_tread_works' and sp.revoked_at is null and sp.starts_at <= now() and sp.ends_at > now()
     and spv.vehicle_id in (select id from vehicle where owner_id = '${ada.id}') limit 1`,
  );
  const big = size === "large" ? (await q<{ id: string }>(`select md5('bigcar')::uuid::text as id`))[0].id : null;
  const fixture = { size, today, adaCarId: adaCar.id, adaSetId: adaSet.id, adaTireIds: adaTires.map((t) => t.id), passId: pass?.pass_id ?? null, passVehicleId: pass?.vehicle_id ?? null, bigCarId: big, bigCarOwnerEmail: "driver2001@bench.test", feedToken };
  if (outFile) fs.writeFileSync(outFile, JSON.stringify(fixture));
  step("done");
} catch (err) {
  console.error(err);
  process.exitCode = 1;
} finally {
  await closeDb();
}
export {};
