// Sourcing queries take the database or a transaction first, so that an action (or an optimiser
// building on them) can run several inside one transaction.
import type { Kysely, Transaction } from "kysely";
import type { Database } from "../db-schema";

export type Executor = Kysely<Database> | Transaction<Database>;
