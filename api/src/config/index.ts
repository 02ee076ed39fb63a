import { appConfig } from './app.config.js';
import { authConfig } from './auth.config.js';
import { databaseConfig } from './database.config.js';
import { mailConfig } from './mail.config.js';
import { throttleConfig } from './throttle.config.js';
import { uploadsConfig } from './uploads.config.js';

export { appConfig, authConfig, databaseConfig, mailConfig, throttleConfig, uploadsConfig };
export { DEMO_JWT_SECRET } from './auth.config.js';
export { environmentProblem, validateEnvironment } from './env.validation.js';
export { configWarnings } from './warnings.js';

export const configNamespaces = [
  appConfig,
  authConfig,
  databaseConfig,
  mailConfig,
  throttleConfig,
  uploadsConfig,
];
