import { timestamp, uuid } from 'drizzle-orm/pg-core';

/** Columns every table shares. */
export const id = () => uuid().primaryKey().defaultRandom();
export const createdAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();
