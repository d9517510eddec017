import { afterAll, beforeAll } from 'vitest';
import { createApp } from '../../../server/http/app';
import { prepareFuzz, serveOnLoopback, type FuzzContext } from './context';

/**
 * Serves a fresh app on loopback for one fuzz test file and prepares its signed-in context; closes both after.
 * Returns a getter, because the context exists only once `beforeAll` has run.
 */
export function useFuzzApp(): () => FuzzContext {
  const { app, close } = createApp();
  let ctx: FuzzContext | undefined;
  let served: Awaited<ReturnType<typeof serveOnLoopback>> | undefined;
  beforeAll(async () => {
    served = await serveOnLoopback(app);
    ctx = await prepareFuzz(app, served.base);
  });
  afterAll(async () => {
    await served?.stop();
    await close();
  });
  return () => {
    if (!ctx) throw new Error('fuzz context used before beforeAll ran');
    return ctx;
  };
}
