import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { mailOutbox } from "@/db/schema";

/** The newest queued message to an address and the one-time token in its link. */
export async function lastLinkTo(address: string, path: "/invite" | "/reset-password"): Promise<{ text: string; token: string }> {
  const [mail] = await db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, address)).orderBy(desc(mailOutbox.id)).limit(1);
  if (!mail) throw new Error(`no mail to ${address}`);
  const match = new RegExp(`https?://[^\\s]+${path}\\?token=([A-Za-z0-9_%-]+)`).exec(mail.textBody);
  if (!match) throw new Error(`no ${path} link in the mail to ${address}`);
  return { text: mail.textBody, token: decodeURIComponent(match[1]) };
}
