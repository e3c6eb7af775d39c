import type { Db } from "@/db";

/** The database or a transaction opened on it: query functions take either. */
export type DbOrTx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];
