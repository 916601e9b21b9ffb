import type { SearchDoc } from "@/lib/search/types";

/** Invented write-ups for the search tests. */
export function doc(id: number, fields: Partial<SearchDoc>): SearchDoc {
  return {
    id, title: "", summary: "", text: "", causes: [], causeSlugs: [], parts: [], families: [], familySlugs: [], tags: [],
    publishedAt: `2025-0${(id % 9) + 1}-01T10:00:00.000Z`, ...fields,
  };
}

export const DOCS: SearchDoc[] = [
  doc(1, {
    title: "Two sprags rolled over after a drop",
    summary: "A crack under load and drive that came and went.",
    text: "The rider landed a drop with weight on the forward pedal. The clutch assembly was replaced.",
    causes: ["Sprag clutch worn"], causeSlugs: ["sprag-clutch-worn"],
    parts: ["Sprag clutch assembly"], families: ["Skarn Gen 1"], familySlugs: ["quillon-skarn-1"], tags: ["clutch", "trail"],
  }),
  doc(2, {
    title: "Needle bearing ruined by a pressure washer",
    summary: "Grinding after every wash: water past the crank seal.",
    text: "The needle bearing ran wet and the shaft surface under it was pitted. New shaft sleeve and seals.",
    causes: ["Needle bearing water damage"], causeSlugs: ["needle-bearing-water"],
    parts: ["Needle bearing", "Crank seal"], families: ["Kestrum"], familySlugs: ["orvanta-kestrum-1"], tags: ["water", "bearing"],
  }),
  doc(3, {
    title: "Loud crack when landing jumps",
    summary: "Noise on landings, no slip on the road.",
    text: "Opened the unit: one sprag sat at the wrong angle. Another sprag was polished. The sprag cage was fine.",
    causes: ["Gear tooth broken"], causeSlugs: ["gear-tooth-broken"],
    parts: ["Output gear"], families: ["Skarn Gen 1"], familySlugs: ["quillon-skarn-1"], tags: ["trail", "noise"],
  }),
  doc(4, {
    title: "Belt skipping on a loaded cargo start",
    summary: "A glazed belt slipping over the pulley teeth with a full load.",
    text: "Tension was low and the belt glazed. Replaced belt and tensioner spring.",
    causes: ["Belt worn"], causeSlugs: ["belt-worn"],
    parts: ["Drive belt"], families: ["Carrow Gen 1"], familySlugs: ["carrow-1"], tags: ["cargo", "belt"],
  }),
  doc(5, {
    title: "Crank bearing growl on a commuter",
    summary: "A growl that rose with cadence; the drive-side crank bearing was rough.",
    text: "Salt and grit inside the bearing. Pressed in a new one to depth.",
    causes: ["Crank bearing worn"], causeSlugs: ["crank-bearing-ds-worn"],
    parts: ["Crank bearing"], families: ["Fennel Gen 1"], familySlugs: ["pellacor-fennel-1"], tags: ["bearing", "commuting"],
  }),
];
