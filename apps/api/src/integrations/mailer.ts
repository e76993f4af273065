import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config/env.js';

export function createMailTransport(config: Pick<Config, 'SMTP_HOST' | 'SMTP_PORT'>): Transporter {
  return nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: false,
    ignoreTLS: config.SMTP_HOST === '127.0.0.1' || config.SMTP_HOST === 'localhost',
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
}
