import { registerAs } from '@nestjs/config';
import { envBool, envInt, envString } from './env.js';

export const mailConfig = registerAs('mail', () => {
  const fake = envBool('SMTP_FAKE', true);
  return {
    /** Start the in-process SMTP fake; the transport then points at it unless SMTP_HOST is set. */
    fake,
    fakePort: envInt('SMTP_FAKE_PORT', 2525),
    host: envString('SMTP_HOST', '127.0.0.1'),
    /** 0 = the fake's actual port. */
    port: envInt('SMTP_PORT', 0),
    from: envString('MAIL_FROM', 'Ligament <no-reply@ligament.example.test>'),
    /** Outbox worker interval; 0 disables the worker (tests flush by hand). */
    retryIntervalMs: envInt('MAIL_RETRY_INTERVAL_MS', 3000),
    /** First retry delay after a failed send; doubles per attempt, at most 10 minutes. */
    retryBaseMs: envInt('MAIL_RETRY_BASE_MS', 5000),
  };
});
