import nodemailer, { type Transporter } from 'nodemailer';

let transport: Transporter | undefined;
let transportUrl: string | undefined;

export function smtpUrl(): string {
  return process.env.SMTP_URL || 'smtp://127.0.0.1:2525';
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
  return process.env.MAIL_FROM || 'Pourproof <no-reply@pourproof.test>';
}
