// The test app listening on a random loopback port, serving the built web app from dist/.
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { seedDemo } from '../../server/seed/demo';
import { startTestApp, type TestApp } from './test-app';

export type LiveServer = TestApp & { url: string };

export async function startLiveServer(): Promise<LiveServer> {
  const t = await startTestApp();
  await seedDemo(t.sequelize);
  const server = await new Promise<Server>((resolve) => {
    const s = t.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    ...t,
    url: `http://127.0.0.1:${port}`,
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await t.close();
    },
  };
}
