// Shop roles for the organization plugin: an owner runs the shop account, a
// technician works under the passes the shop holds.
import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements, memberAc, ownerAc } from "better-auth/plugins/organization/access";

export const ac = createAccessControl(defaultStatements);

export const shopRoles = {
  owner: ac.newRole(ownerAc.statements),
  technician: ac.newRole(memberAc.statements),
};

export type ShopRole = keyof typeof shopRoles;
