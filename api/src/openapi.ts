/**
 * Writes api/openapi.json from the Swagger document, without listening and without touching the
 * real database (in-memory SQLite, no SMTP fake, no demo seed). Run by `npm run openapi -w api`.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { setOpenApiEnvironment } from './config/openapi-env.js';

setOpenApiEnvironment();
const { createApp, buildOpenApi } = await import('./create-app.js');
const app = await createApp({ logger: ['error'] });
const document = buildOpenApi(app);
const target = fileURLToPath(new URL('../openapi.json', import.meta.url));
writeFileSync(target, `${JSON.stringify(document, null, 2)}\n`);
await app.close();
process.stdout.write(`Wrote ${target} (${Object.keys(document.paths).length} paths)\n`);
