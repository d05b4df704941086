import { decimal, int, mysqlEnum, mysqlTable, timestamp, varchar } from "drizzle-orm/mysql-core";
import { autoId, createdAt, updatedAt } from "./columns";

export const sites = mysqlTable("sites", {
  id: autoId(),
  slug: varchar("slug", { length: 64 }).notNull().unique(),
  name: varchar("name", { length: 191 }).notNull(),
  latitude: decimal("latitude", { precision: 9, scale: 6, mode: "number" }).notNull(),
  longitude: decimal("longitude", { precision: 9, scale: 6, mode: "number" }).notNull(),
  timeZone: varchar("time_zone", { length: 64 }).notNull(),
  contactName: varchar("contact_name", { length: 191 }),
  contactEmail: varchar("contact_email", { length: 191 }),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** A door model fixes the drive train every controller of that model shares. */
export const doorModels = mysqlTable("door_models", {
  id: autoId(),
  code: varchar("code", { length: 32 }).notNull().unique(),
  name: varchar("name", { length: 191 }).notNull(),
  doorWidthMm: int("door_width_mm").notNull(),
  doorTravelMm: int("door_travel_mm").notNull(),
  spoolDiameterMm: decimal("spool_diameter_mm", { precision: 6, scale: 2, mode: "number" }).notNull(),
  cordDiameterMm: decimal("cord_diameter_mm", { precision: 5, scale: 2, mode: "number" }).notNull(),
  gearboxRatio: decimal("gearbox_ratio", { precision: 8, scale: 2, mode: "number" }).notNull(),
  encoderPulsesPerRev: int("encoder_pulses_per_rev").notNull(),
  encoderDecoding: mysqlEnum("encoder_decoding", ["x1", "x2", "x4"]).notNull(),
  motorNoLoadRpm: int("motor_no_load_rpm").notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});
