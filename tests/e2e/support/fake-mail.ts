/** Messages the fake SMTP server caught (its control port), newest last. */
export interface CaughtMessage { subject: string; from: string; to: string; text: string; envelopeTo: string[] }

export async function waitForMail(controlUrl: string, to: string, timeoutMs = 20_000): Promise<CaughtMessage> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const messages = (await (await fetch(`${controlUrl}/messages`)).json()) as CaughtMessage[];
    const found = messages.filter((m) => m.envelopeTo.includes(to)).pop();
    if (found) return found;
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}
