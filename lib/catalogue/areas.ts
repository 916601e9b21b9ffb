import type { CauseArea } from "@/db/schema";

export const AREA_LABELS: Record<CauseArea, string> = {
  clutch: "One-way clutches",
  bearing: "Bearings",
  seal: "Seals and water paths",
  drive_train: "Belts and gears",
  sensor: "Sensors",
  electronics: "Electronics",
  cable: "Cables and connectors",
  firmware: "Firmware",
  housing: "Housing",
  other: "Other",
};
