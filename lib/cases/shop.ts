import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db, type Db, type Tx } from "@/db";
import { settings } from "@/db/schema";
import demoWorkshop from "@/content/catalogue/workshop.json";

const shopSchema = z.object({
  name: z.string().min(1),
  email: z.string().min(3),
  phone: z.string().default(""),
  openingHours: z.string().default(""),
  /** Two capital letters at the front of every case reference. */
  code: z.string().regex(/^[A-Z]{2}$/).optional(),
});

export interface Shop {
  name: string;
  email: string;
  phone: string;
  openingHours: string;
  code: string;
}

/** Two letters from the shop's name: the first letters of its first two words. */
export function shopCode(name: string): string {
  const words = name.toUpperCase().replace(/[^A-Z ]/g, " ").split(/\s+/).filter(Boolean);
  const letters = words.length >= 2 ? words[0][0] + words[1][0] : (words[0] ?? "RB").slice(0, 2).padEnd(2, "X");
  return letters;
}

/** The shop from the settings table (key "workshop"), else the demo workshop file. */
export async function loadShop(conn: Db | Tx = db): Promise<Shop> {
  const [row] = await conn.select({ value: settings.value }).from(settings).where(eq(settings.key, "workshop")).limit(1);
  const parsed = shopSchema.safeParse(row?.value ?? demoWorkshop);
  const shop = parsed.success ? parsed.data : shopSchema.parse(demoWorkshop);
  return { name: shop.name, email: shop.email, phone: shop.phone, openingHours: shop.openingHours, code: shop.code ?? shopCode(shop.name) };
}

/** The shop as the sender of its mail: "Name <address>". */
export function shopSender(shop: Pick<Shop, "name" | "email">): string {
  return `${shop.name} <${shop.email}>`;
}
