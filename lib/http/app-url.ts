/**
 * The app's public address, for links that leave the browser (e-mails, the job card's QR code):
 * APP_URL, never the Host header of a request (anyone can send a request with a Host of their
 * choosing and so receive the link).
 */
export function appUrl(env: NodeJS.ProcessEnv = process.env): string {
  return (env.APP_URL ?? `http://localhost:${env.PORT ?? 3000}`).replace(/\/+$/, "");
}
