// The inbox: received messages, newest first, persisted to a JSON file.
import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export interface StoredMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  /** When the fake received it (ISO 8601). */
  date: string;
  text: string;
  html: string | null;
}

export const MAX_MESSAGES = 500;

export class MailStore {
  private messages: StoredMessage[] = [];

  constructor(private readonly file: string) {
    try {
      const loaded: unknown = JSON.parse(readFileSync(file, 'utf8'));
      if (Array.isArray(loaded)) this.messages = (loaded as StoredMessage[]).slice(0, MAX_MESSAGES);
    } catch {
      // no inbox yet
    }
  }

  add(message: StoredMessage): void {
    this.messages = [message, ...this.messages].slice(0, MAX_MESSAGES);
    this.save();
  }

  /** Newest first; `to` matches any recipient, case-insensitively. */
  list(to?: string): StoredMessage[] {
    if (!to) return [...this.messages];
    const wanted = to.trim().toLowerCase();
    return this.messages.filter((message) => message.to.some((address) => address.toLowerCase() === wanted));
  }

  get(id: string): StoredMessage | undefined {
    return this.messages.find((message) => message.id === id);
  }

  clear(): void {
    this.messages = [];
    this.save();
  }

  // Synchronous write then rename: never a half-written file, and no interleaved saves.
  private save(): void {
    mkdirSync(path.dirname(this.file), { recursive: true });
    const temp = `${this.file}.tmp`;
    writeFileSync(temp, JSON.stringify(this.messages));
    renameSync(temp, this.file);
  }
}
