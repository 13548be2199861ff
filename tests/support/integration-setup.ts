// Filled in with the database harness.
export {};
