import type { CaughtMail } from '../../shared/schemas/accounts';

/** Messages kept by the local mail catcher, newest last; at most `LIMIT`, in this process's memory. */
const LIMIT = 500;
const messages: CaughtMail[] = [];
const waiters = new Set<() => void>();
let nextId = 1;
let catcherPort: number | null = null;

/** The local mail catcher's port while it runs, else null (kept here so reading it never loads the catcher). */
export function mailCatcherPort(): number | null {
  return catcherPort;
}

export function noteMailCatcherPort(port: number | null): void {
  catcherPort = port;
}

export function keepMail(mail: Omit<CaughtMail, 'id'>): CaughtMail {
  const kept = { ...mail, id: nextId++ };
  messages.push(kept);
  if (messages.length > LIMIT) messages.splice(0, messages.length - LIMIT);
  for (const wake of waiters) wake();
  return kept;
}

/** Every kept message, newest first. */
export function caughtMail(): CaughtMail[] {
  return [...messages].reverse();
}

/**
 * Resolves with the newest message that matches, waiting for it to arrive (mail is sent after the HTTP
 * answer for password resets); rejects after `timeoutMs`.
 */
export function waitForMail(match: (m: CaughtMail) => boolean, timeoutMs = 5_000): Promise<CaughtMail> {
  return new Promise((resolve, reject) => {
    const check = () => {
      const found = caughtMail().find(match);
      if (!found) return false;
      waiters.delete(check);
      clearTimeout(timer);
      resolve(found);
      return true;
    };
    const timer = setTimeout(() => {
      waiters.delete(check);
      reject(new Error(`no matching mail within ${timeoutMs} ms`));
    }, timeoutMs);
    waiters.add(check);
    check();
  });
}
