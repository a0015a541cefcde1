// Every table, one file per domain. drizzle-kit reads this file.
export * from "./teams";
export * from "./access";
export * from "./ladders";
export * from "./training";
export * from "./logs";
export * from "./promotions";
export * from "./notifications";
export * from "./form-checks";
export * from "./billing";
