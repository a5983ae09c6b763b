import { it } from 'vitest';
import { startTestServer, stopTestServer } from '../helpers/server.js';
it('list', async () => {
  const r = await startTestServer();
  const app = r.server.listeners('request')[0] as any;
  for (const l of app.router.stack.slice(0, 12)) console.log('LAYER', JSON.stringify(l.rawPath), l.name, !!l.route, l.handle?.stack?.length, l.handle?.stack?.map((x: any) => [x.rawPath, x.route?.path]));
  await stopTestServer();
});
