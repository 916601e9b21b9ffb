import type { UpgradeKind } from "@/db/schema";
import type { CauseGroup } from "./groups";

export interface Upgrade {
  slug: UpgradeKind;
  /** As the bench form and reports name it. */
  name: string;
  /** Lower-case, for sentences: "units with the … came back …". */
  phrase: string;
  /** The cause group whose faults it is meant to prevent; the comparison is among repairs in that group. */
  guards: CauseGroup;
}

export const UPGRADES: readonly Upgrade[] = [
  { slug: "uprated-clutch", name: "Uprated one-way clutch", phrase: "the uprated one-way clutch", guards: "clutch" },
  { slug: "crank-seal-barrier", name: "Added crank seal and grease barrier", phrase: "the added crank seal and grease barrier", guards: "sealing" },
  { slug: "sealed-bearings", name: "Sealed bearings", phrase: "sealed bearings", guards: "sealing" },
  { slug: "sealed-screws", name: "Housing screws sealed", phrase: "sealed housing screws", guards: "electrics" },
  { slug: "conformal-coating", name: "Board conformal-coated", phrase: "a conformal-coated board", guards: "electrics" },
  { slug: "cable-sleeve", name: "Cable sleeve and re-route", phrase: "the cable sleeve and re-route", guards: "electrics" },
];

export function upgradeNamed(slug: string): Upgrade | undefined {
  return UPGRADES.find((u) => u.slug === slug);
}
