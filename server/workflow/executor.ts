import type { Database, Transaction } from '../../db/client';

export type Executor = Database | Transaction;
