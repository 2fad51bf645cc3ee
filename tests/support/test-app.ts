import { createApp } from '../../server/app';
import type { AppDependencies } from '../../server/app-dependencies';
import { loadConfig } from '../../server/config';
import { createDependencies } from '../../server/create-dependencies';

/** The real app and its real dependencies (the stack `npm test` started), without listening. */
export function createTestApp(): { app: ReturnType<typeof createApp>; deps: AppDependencies } {
  const deps = createDependencies(loadConfig());
  return { app: createApp(deps), deps };
}
