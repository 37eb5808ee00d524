import { randomUUID } from 'node:crypto';
import { mkdir, readdir, readFile, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { storedMailSchema, type StoredMail } from './mail-message';

/**
 * The fake mailbox: every message the fake transport "sends" is kept as one JSON file in a folder
 * (${DATA_DIR}/mailbox/ by default), so invitations and password resets work with no mail account.
 * Links inside the text and HTML are kept byte for byte.
 */
export class FileMailbox {
  constructor(readonly dir: string) {}

  async save(mail: Omit<StoredMail, 'id' | 'sentAt'>, sentAt: Date): Promise<StoredMail> {
    const stored = storedMailSchema.parse({ ...mail, id: randomUUID(), sentAt: sentAt.toISOString() });
    await mkdir(this.dir, { recursive: true });
    // Write then rename, so a reader never sees half a message.
    const file = path.join(this.dir, `${stored.id}.json`);
    const tmp = `${file}.tmp`;
    await writeFile(tmp, JSON.stringify(stored, null, 2), 'utf8');
    await rename(tmp, file);
    return stored;
  }

  /** Newest first; `to` keeps only messages to that address (case-insensitive). */
  async list(filter: { to?: string } = {}): Promise<StoredMail[]> {
    let names: string[];
    try {
      names = (await readdir(this.dir)).filter((n) => n.endsWith('.json'));
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') return [];
      throw err;
    }
    const all: StoredMail[] = [];
    for (const name of names) {
      const mail = await this.read(path.join(this.dir, name));
      if (mail) all.push(mail);
    }
    const to = filter.to?.trim().toLowerCase();
    return all
      .filter((m) => !to || m.to.toLowerCase() === to)
      .sort((a, b) => (a.sentAt === b.sentAt ? a.id.localeCompare(b.id) : a.sentAt < b.sentAt ? 1 : -1));
  }

  async get(id: string): Promise<StoredMail | null> {
    if (!/^[0-9a-f-]{36}$/i.test(id)) return null;
    return this.read(path.join(this.dir, `${id.toLowerCase()}.json`));
  }

  private async read(file: string): Promise<StoredMail | null> {
    try {
      const parsed = storedMailSchema.safeParse(JSON.parse(await readFile(file, 'utf8')));
      return parsed.success ? parsed.data : null;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT' || err instanceof SyntaxError) return null;
      throw err;
    }
  }
}
