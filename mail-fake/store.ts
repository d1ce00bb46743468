import { randomUUID } from 'node:crypto';
import { appendFile, mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';

export type StoredMessage = {
  id: string;
  from: string;
  // Envelope recipients: who the message was actually delivered to, Bcc included.
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  // The Message-ID header the sender set (without angle brackets), or null.
  messageId: string | null;
  at: string;
};

// Every message in memory, mirrored to a JSON-lines file so a restart keeps them.
export class MailStore {
  private messages: StoredMessage[] = [];
  // Appends are chained so lines land in arrival order.
  private writing: Promise<void> = Promise.resolve();

  constructor(readonly file: string) {}

  async load(): Promise<void> {
    await mkdir(path.dirname(this.file), { recursive: true });
    let raw = '';
    try {
      raw = await readFile(this.file, 'utf8');
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err;
    }
    this.messages = [];
    for (const line of raw.split('\n')) {
      if (!line.trim()) continue;
      try {
        this.messages.push(JSON.parse(line) as StoredMessage);
      } catch {
        // A line cut short by a crash is skipped, not fatal.
      }
    }
  }

  add(message: Omit<StoredMessage, 'id' | 'at'>): Promise<StoredMessage> {
    const stored: StoredMessage = { id: randomUUID(), at: new Date().toISOString(), ...message };
    this.messages.push(stored);
    const line = `${JSON.stringify(stored)}\n`;
    this.writing = this.writing.then(() => appendFile(this.file, line));
    return this.writing.then(() => stored);
  }

  newestFirst(to?: string): StoredMessage[] {
    const wanted = to?.toLowerCase();
    return this.messages
      .filter((m) => !wanted || m.to.some((addr) => addr.toLowerCase() === wanted))
      .reverse();
  }

  clear(): Promise<void> {
    this.messages = [];
    this.writing = this.writing.then(() => writeFile(this.file, ''));
    return this.writing;
  }
}
