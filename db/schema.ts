// The whole database schema: tables (one file per area under db/tables), then relations, then types.
export * from "./tables/auth";
export * from "./tables/workspaces";
