// Who is reading or writing a vehicle's logbook: its owner, or a shop's
// staff member under a driver's pass. Every logbook query takes one of these
// and checks it against the vehicle (db/queries/access.ts).
export type LogbookAccess =
  | { kind: "owner"; userId: string; userName: string }
  | {
      kind: "pass";
      userId: string;
      userName: string;
      passId: string;
      shopId: string;
      shopName: string;
      scope: "view" | "view_add";
      vehicleIds: string[];
      /** When the pass ends; requests after it are refused. */
      endsAt: Date;
    };

export function ownerAccess(session: { user: { id: string; name: string } }): LogbookAccess {
  return { kind: "owner", userId: session.user.id, userName: session.user.name };
}

export function canWrite(access: LogbookAccess): boolean {
  return access.kind === "owner" || access.scope === "view_add";
}
