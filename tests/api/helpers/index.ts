export * from "./app";
export * from "./agent";
