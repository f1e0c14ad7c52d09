// @ts-nocheck
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';

/** Someone the fake provider can sign in as. */
export interface FakePerson {
  subject: string;
  name: string;
  email: string;
  /** A line shown under the name on the picker, e.g. "organisation admin". */
  note?: string;
}

/**
 * The people the picker offers: the invented demo people, plus anyone typed in on the picker page,
 * kept in the data folder so they are offered again after a restart.
 */
export class FakePeople {
  private readonly typed = new Map<string, FakePerson>();

  constructor(
    private readonly demo: FakePerson[],
    private readonly file?: string,
  ) {
    if (file && existsSync(file)) {
      for (const person of JSON.parse(readFileSync(file, 'utf8')) as FakePerson[]) this.typed.set(person.subject, person);
    }
  }

  all(): { demo: FakePerson[]; typed: FakePerson[] } {
    return { demo: this.demo, typed: [...this.typed.values()] };
  }

  bySubject(subject: string): FakePerson | undefined {
    return this.demo.find((p) => p.subject === subject) ?? this.typed.get(subject);
  }

  /** A person typed on the picker; the same e-mail always gets the same subject. */
  addTyped(name: string, email: string): FakePerson {
    const normalised = email.trim().toLowerCase();
    const demo = this.demo.find((p) => p.email === normalised);
    if (demo) return demo;
    const subject = `local-${createHash('sha256').update(normalised).digest('hex').slice(0, 16)}`;
    const person = { subject, name: name.trim(), email: normalised };
    this.typed.set(subject, person);
    if (this.file) {
      mkdirSync(path.dirname(this.file), { recursive: true });
      writeFileSync(this.file, JSON.stringify([...this.typed.values()], null, 2));
    }
    return person;
  }
}
