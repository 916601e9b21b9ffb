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

const eur = new Intl.NumberFormat("en-IE", { style: "currency", currency: "EUR", maximumFractionDigits: 0 });
const eurCents = new Intl.NumberFormat("en-IE", { style: "currency", currency: "EUR", minimumFractionDigits: 2 });

/** A price band in whole euros, "€160–€260"; one figure when both ends agree. */
export function priceBand(lowCents: number, highCents: number): string {
  if (lowCents === highCents) return eur.format(lowCents / 100);
  return `${eur.format(lowCents / 100)}–${eur.format(highCents / 100)}`;
}

export function euros(cents: number): string {
  return eurCents.format(cents / 100);
}

/** "1 h 15 min", "40 min". */
export function minutes(total: number): string {
  if (total < 60) return `${total} min`;
  const h = Math.floor(total / 60);
  const m = total % 60;
  return m ? `${h} h ${m} min` : `${h} h`;
}
