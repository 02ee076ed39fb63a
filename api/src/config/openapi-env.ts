/** Settings for generating the OpenAPI document: nothing real is opened or started. */
export function setOpenApiEnvironment(): void {
  process.env.LIGAMENT_DB = ':memory:';
  process.env.SMTP_FAKE = 'false';
  process.env.LIGAMENT_DEMO = 'false';
  process.env.MAIL_RETRY_INTERVAL_MS = '0';
  // Not demo mode, so a secret is required; this one signs nothing (the app never listens).
  process.env.JWT_SECRET ??= 'openapi-generation-only-secret';
}
