import { customType, timestamp, uuid } from 'drizzle-orm/pg-core';

/** Columns every table shares. */
export const id = () => uuid().primaryKey().defaultRandom();
export const createdAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();
export const updatedAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();

/** Raw file bytes (uploads keep the original so an import can be traced and re-run). */
export const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });
