// API tests need the stack that `npm test` starts; say so plainly when run without it.
export default function globalSetup() {
  for (const name of [
    'DATABASE_URL',
    'SESSION_SECRET',
    'OIDC_ISSUER',
    'MAIL_SINK_URL',
    'TEST_APP_URL',
  ]) {
    if (!process.env[name]) {
      throw new Error(
        `${name} is not set: run API tests through \`npm test\` (e.g. npm test -- tests/api/members.test.ts)`,
      );
    }
  }
}
