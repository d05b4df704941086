export * from "./auth";
export * from "./mail";
export * from "./fleet";
export * from "./audit";
