export * from "./roles";
export * from "./subjects";
export * from "./abilities";
export * from "./operator";
export * from "./authorize";
