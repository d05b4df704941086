// An invented scenario: Hollowmere Door Works, a small firm that builds and services
// pop-hole door controllers for farms and co-ops on three continents.
import type { Role } from "@/lib/auth/permissions";

export const DEMO_COMPANY = "Hollowmere Door Works";

export const demoUsers: { name: string; email: string; role: Role; password: string }[] = [
  { name: "Ada Fenwick", email: "admin@hollowmere.example", role: "admin", password: "roostline-admin" },
  { name: "Bram Okafor", email: "engineer@hollowmere.example", role: "engineer", password: "roostline-engineer" },
  { name: "Cleo Marchetti", email: "reviewer@hollowmere.example", role: "reviewer", password: "roostline-reviewer" },
  { name: "Dov Lindqvist", email: "reviewer2@hollowmere.example", role: "reviewer", password: "roostline-reviewer" },
  { name: "Esi Tamura", email: "technician@hollowmere.example", role: "technician", password: "roostline-technician" },
  { name: "Finn Aldous", email: "viewer@hollowmere.example", role: "viewer", password: "roostline-viewer" },
];

export const demoSites = [
  // Above 55° N: long summer evenings, short winter days; in MSF range.
  { slug: "corrie-brae", name: "Corrie Brae Croft", latitude: 57.4778, longitude: -4.2247, timeZone: "Europe/London", contactName: "Morag Innes", contactEmail: "morag@corriebrae.example" },
  // Central Europe, inside DCF77 range.
  { slug: "lindenhof", name: "Lindenhof Co-op", latitude: 48.3705, longitude: 10.8978, timeZone: "Europe/Berlin", contactName: "Jonas Weber", contactEmail: "jonas@lindenhof.example" },
  // Southern hemisphere: seasons reversed, no radio time signal, uses GNSS.
  { slug: "wattle-creek", name: "Wattle Creek Free Range", latitude: -37.5622, longitude: 143.8503, timeZone: "Australia/Melbourne", contactName: "Priya Nair", contactEmail: "priya@wattlecreek.example" },
  // North America, WWVB range.
  { slug: "prairie-gate", name: "Prairie Gate Hens", latitude: 40.5853, longitude: -105.0844, timeZone: "America/Denver", contactName: "Luis Ortega", contactEmail: "luis@prairiegate.example" },
];

export const demoDoorModels = [
  { code: "HM-220", name: "Hatchling 220", doorWidthMm: 220, doorTravelMm: 300, spoolDiameterMm: 16, cordDiameterMm: 1.2, gearboxRatio: 150, encoderPulsesPerRev: 12, encoderDecoding: "x4" as const, motorNoLoadRpm: 6000 },
  { code: "HM-350", name: "Henhouse 350", doorWidthMm: 350, doorTravelMm: 420, spoolDiameterMm: 25, cordDiameterMm: 1.5, gearboxRatio: 100, encoderPulsesPerRev: 16, encoderDecoding: "x4" as const, motorNoLoadRpm: 5000 },
  { code: "HM-500G", name: "Gooseway 500", doorWidthMm: 500, doorTravelMm: 600, spoolDiameterMm: 32, cordDiameterMm: 2, gearboxRatio: 270, encoderPulsesPerRev: 7, encoderDecoding: "x2" as const, motorNoLoadRpm: 9000 },
];
