import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '@/lib/env';

let transport: Transporter | undefined;
let transportUrl: string | undefined;

export function smtpUrl(): string {
  return env().SMTP_URL;
}

export function getTransport(): Transporter {
  const url = smtpUrl();
  if (!transport || transportUrl !== url) {
    transport = nodemailer.createTransport(url, { connectionTimeout: 5000, greetingTimeout: 5000, socketTimeout: 10000 });
    transportUrl = url;
  }
  return transport;
}

export function mailFrom(): string {
  return env().MAIL_FROM;
}
