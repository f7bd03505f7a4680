export * from "./auth";
export * from "./clubs";
export * from "./audit";
export * from "./outbox";
export * from "./uploads";
export * from "./fleet";
export * from "./safety";
export * from "./money";
