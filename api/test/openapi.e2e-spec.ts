import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { setOpenApiEnvironment } from '../src/config/openapi-env.js';

it('keeps api/openapi.json equal to the document the routes and DTOs describe', async () => {
  // After changing a route or a DTO: `npm run openapi -w api`, then `npm run gen:api -w web`.
  setOpenApiEnvironment();
  const { createApp, buildOpenApi } = await import('../src/create-app.js');
  const app = await createApp({ logger: false });
  try {
    const committed: unknown = JSON.parse(readFileSync(join(__dirname, '..', 'openapi.json'), 'utf8'));
    expect(JSON.parse(JSON.stringify(buildOpenApi(app)))).toEqual(committed);
  } finally {
    await app.close();
  }
});
