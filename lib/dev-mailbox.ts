import type { Caller } from './access';

/** The Dev mailbox is open outside production, when npm start/test enable it, or to site admins. */
export function devMailboxAllowed(caller: Caller | null): boolean {
  return process.env.NODE_ENV !== 'production' || process.env.SEAMLINE_DEV_MAILBOX === '1' || caller?.siteRole === 'admin';
}
