/**
 * Global setup of the browser tests: one build and one preview server for every test
 * file, stopped when the run ends.
 */
import { buildApp, serverIsUp, startPreview, PORT } from './harness.ts';

export default async function setup(): Promise<(() => Promise<void>) | undefined> {
  if (await serverIsUp()) {
    // Another run of the browser tests serves the app already; use it rather than fail.
    console.warn(`Port ${PORT} already serves the app; these tests use that server.`);
    return undefined;
  }
  buildApp();
  const server = await startPreview();
  return () => server.stop();
}
