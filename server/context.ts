import type { Db } from './db/connect.js';
import type { Mailer } from './mail.js';

/** What createApp needs from outside; nothing in the app reads process.env. */
export interface AppDeps {
  db: Db;
  mailer: Mailer;
  /** Base of links in mails and share URLs, without a trailing slash. */
  publicUrl: string;
  production?: boolean;
  /** The built web app (dist/web); omitted, only the API is served. */
  webDir?: string;
  /** Sign-in attempts a minute per e-mail address. */
  loginLimit?: number;
  log?: (error: unknown) => void;
}
