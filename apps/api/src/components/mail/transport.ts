import nodemailer, { type Transporter } from 'nodemailer';

import type { Config } from '../../config.js';

/** SMTP transport to the local fake (at its bound port) or to the configured server. */
export function createMailTransport(config: Config, fake: { host: string; port: number } | null): Transporter {
  const timeouts = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 };
  if (fake) {
    return nodemailer.createTransport({ host: fake.host, port: fake.port, secure: false, ignoreTLS: true, ...timeouts });
  }
  return nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE,
    ...(config.SMTP_USER && config.SMTP_PASSWORD ? { auth: { user: config.SMTP_USER, pass: config.SMTP_PASSWORD } } : {}),
    ...timeouts,
  });
}
