import nodemailer, { type Transporter } from "nodemailer";

export interface SmtpConfig {
  host: string;
  port: number;
}

export function smtpConfigFromEnv(env: NodeJS.ProcessEnv = process.env): SmtpConfig {
  return { host: env.SMTP_HOST ?? "127.0.0.1", port: Number(env.SMTP_PORT ?? 2525) };
}

/**
 * Plain SMTP to the configured host. The local fake speaks no TLS, so STARTTLS is not tried;
 * a real relay would be configured with TLS and credentials here.
 */
export function smtpTransport(config: SmtpConfig): Transporter {
  return nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
}
