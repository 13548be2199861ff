// The demo's invented accounts, importable without a database (e2e tests use them).
export const DEMO_PASSWORD = "tread-carefully-26";

export const demoAccounts = {
  ada: { name: "Ada Renwick", email: "ada@renwick.test", role: "driver (Plus plan)" },
  tomas: { name: "Tomas Renwick", email: "tomas@renwick.test", role: "driver (Free plan)" },
  wren: { name: "Wren Halloway", email: "wren@quillby-tread.test", role: "shop owner" },
  jo: { name: "Jo Marsh", email: "jo@quillby-tread.test", role: "technician" },
  ops: { name: "Fourpatch Operations", email: "ops@fourpatch.test", role: "admin" },
} as const;

export const DEMO_SHOP = {
  id: "shop_quillby_tread_works",
  name: "Quillby Tread Works",
  slug: "quillby-tread-works",
  town: "Quillby Ford",
  address: "4 Kettle Lane, Quillby Ford",
  phone: "+00 555 0142",
  email: "desk@quillby-tread.test",
};
