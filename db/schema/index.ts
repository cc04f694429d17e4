// Every table of the app, for the Drizzle client and drizzle-kit.
export * from "./auth";
export * from "./sign-in-failures";
export * from "./shows";
export * from "./settings";
export * from "./people";
export * from "./categories";
export * from "./judging";
export * from "./results";
export * from "./entries";
export * from "./payments";
export * from "./audit";
