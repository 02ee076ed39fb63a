import { registerAs } from '@nestjs/config';
import { fileURLToPath } from 'node:url';
import { envBool, envInt, envString } from './env.js';

/** Repository root: api/src/config or api/dist/config → three levels up. */
const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));

export const appConfig = registerAs('app', () => {
  const port = envInt('PORT', 3000);
  return {
    port,
    host: envString('HOST', '127.0.0.1'),
    /** Base address of the web app, used in links in mail and responses. */
    publicUrl: envString('LIGAMENT_PUBLIC_URL', `http://localhost:${port}`).replace(/\/$/, ''),
    /** Built web app served on the same port (SPA fallback for every non-/api path). */
    webDist: envString('LIGAMENT_WEB_DIST', `${repoRoot}web/dist`),
    /** Demo mode: seed an empty database, show the captured mailbox. */
    demo: envBool('LIGAMENT_DEMO', true),
    repoRoot,
  };
});
