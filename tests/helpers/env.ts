/** Integration tests run inside `npm test`, which provides a throw-away database and a running app. */
export function requireEnv(name: 'DATABASE_URL' | 'E2E_BASE_URL'): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run the integration tests through \`npm test\``);
  return value;
}

export const baseUrl = () => requireEnv('E2E_BASE_URL');
