export * from "./auth";
export * from "./mail";
export * from "./fleet";
export * from "./audit";
export * from "./profiles";
export * from "./devices";
