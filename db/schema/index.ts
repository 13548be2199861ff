export * from "./auth";
export * from "./drivers";
export * from "./logbook";
export * from "./shops";
export * from "./billing";
export * from "./household";
