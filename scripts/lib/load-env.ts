// Imported first by every script, so .env.local is in process.env before lib/config reads it.
import { loadLocalEnv } from './env-file';

loadLocalEnv();
