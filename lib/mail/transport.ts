import nodemailer, { type Transporter } from "nodemailer";

export interface SmtpConfig {
  host: string;
  port: number;
  /** SMTP_USER / SMTP_PASSWORD: sign in to the relay (only ever over TLS, see below). */
  user?: string;
  password?: string;
  /** SMTP_SECURE=1: TLS from the first byte (port 465) instead of STARTTLS. */
  secure?: boolean;
  /** SMTP_REQUIRE_TLS=1: refuse to send when the relay offers no STARTTLS. */
  requireTls?: boolean;
}

export function smtpConfigFromEnv(env: NodeJS.ProcessEnv = process.env): SmtpConfig {
  return {
    host: env.SMTP_HOST ?? "127.0.0.1",
    port: Number(env.SMTP_PORT ?? 2525),
    user: env.SMTP_USER || undefined,
    password: env.SMTP_PASSWORD || undefined,
    secure: env.SMTP_SECURE === "1",
    requireTls: env.SMTP_REQUIRE_TLS === "1" || !!env.SMTP_USER,
  };
}

/**
 * SMTP to the configured relay. STARTTLS is used whenever the server offers it (the local fake
 * server does not, so it gets plain SMTP); with credentials, TLS is required, so a password never
 * crosses the network in the clear. Certificates are checked as Node checks them (NODE_EXTRA_CA_CERTS
 * adds a private CA).
 */
export function smtpTransport(config: SmtpConfig, tls?: { ca?: string | Buffer }): Transporter {
  return nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: !!config.secure,
    requireTLS: !config.secure && config.requireTls,
    ...(config.user ? { auth: { user: config.user, pass: config.password ?? "" } } : {}),
    ...(tls?.ca ? { tls: { ca: tls.ca } } : {}),
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
}
