import type { Random } from "@/lib/random";

// Invented callers and dealers for the demo history; none is a real person or business.
const FIRST = ["Alder", "Brin", "Cassia", "Dorrit", "Elsbeth", "Fenn", "Greer", "Hollis", "Ivo", "Jory", "Kestrel", "Linnea",
  "Maelis", "Noor", "Odran", "Perrin", "Quill", "Rhosyn", "Sable", "Tamsin", "Ulric", "Vesna", "Wren", "Yorick", "Zelie"];
const LAST = ["Ashcombe", "Birchley", "Coldwater", "Dunmore", "Eastwick", "Fallowby", "Greyhurst", "Hartwell", "Ibbotsen",
  "Juniper", "Kettering-Vale", "Larchmont", "Moorcroft", "Nettlebed", "Orrin", "Pennywhistle", "Quarrender", "Rookley",
  "Saltmarsh", "Thornbury", "Underhay", "Vantwick", "Wetherell", "Yarrowby"];
const DEALERS = ["Fernbridge Cycles", "Hollow Lane Bikes", "Marrowgate Wheelworks", "Pinecrest Pedal Co.", "Riverbend Rides",
  "Stonemill Cycle Store", "Tallowfield Bikes", "Upper Wend Cycleworks", "Westerhay E-Bikes", "Yewbank Cycle Hub"];

export function callerName(rng: Random, kind: "rider" | "dealer"): string {
  return kind === "dealer" ? rng.pick(DEALERS) : `${rng.pick(FIRST)} ${rng.pick(LAST)}`;
}

export function callerContact(rng: Random, name: string): { phone: string; email: string } {
  const local = name.toLowerCase().replace(/[^a-z]+/g, ".").replace(/^\.|\.$/g, "");
  return {
    phone: `+00 555 ${rng.int(1000, 9999)} ${rng.int(1000, 9999)}`,
    email: `${local}@example.test`,
  };
}

export function serialFor(rng: Random, familySlug: string): string {
  const prefix = familySlug.split("-").map((w) => w[0]?.toUpperCase() ?? "").join("").slice(0, 3);
  return `${prefix}${rng.int(10, 99)}-${rng.int(100000, 999999)}`;
}
