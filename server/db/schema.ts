// Every table of Benchpath, one module per area; drizzle-kit and the database client read them all from here.
export * from "./schema/people.ts";
export * from "./schema/work-orders.ts";
export * from "./schema/flows.ts";
export * from "./schema/sessions.ts";
export * from "./schema/estimates.ts";
export * from "./schema/mail.ts";
export * from "./schema/relations.ts";
