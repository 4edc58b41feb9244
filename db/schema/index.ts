/** The whole schema, one module per area; drizzle-kit reads this file. */
export * from "./auth";
export * from "./audit";
export * from "./runs";
export * from "./logbook";
export * from "./quality";
export * from "./safety";
export * from "./mail";
