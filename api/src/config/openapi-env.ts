/** Settings for generating the OpenAPI document: nothing real is opened or started. */
export function setOpenApiEnvironment(): void {
  process.env.LIGAMENT_DB = ':memory:';
  process.env.SMTP_FAKE = 'false';
  process.env.LIGAMENT_DEMO = 'false';
  process.env.MAIL_RETRY_INTERVAL_MS = '0';
}
