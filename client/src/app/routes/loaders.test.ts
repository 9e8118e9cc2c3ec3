import type { LoaderFunctionArgs } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '@/lib/query-client';
import { stubFetch } from '@/testing/render';
import { clientLoader as projectLoader } from './project';
import { clientLoader as sacLoader } from './sac';

afterEach(() => vi.unstubAllGlobals());

const ok = (body: unknown) => () => ({ status: 200, body });
const args = (params: Record<string, string>) => ({ params, request: new Request('http://localhost/') }) as unknown as LoaderFunctionArgs;

/** Runs a page's loader against a stand-in API and returns the paths it asked for. */
async function pathsAsked(
  load: (qc: ReturnType<typeof createQueryClient>) => (a: LoaderFunctionArgs) => unknown,
  params: Record<string, string>,
  routes: Parameters<typeof stubFetch>[0],
) {
  const { fetchStub, calls } = stubFetch(routes);
  vi.stubGlobal('fetch', fetchStub);
  const qc = createQueryClient();
  qc.setDefaultOptions({ queries: { retry: false } });
  await load(qc)(args(params));
  return calls.filter((c) => c.method === 'GET').map((c) => c.path);
}

const projectRoutes = (myRole: string) => ({
  'GET /api/projects/p1': ok({ id: 'p1', myRole }),
  'GET /api/projects/p1/activity': ok([]),
  'GET /api/projects/p1/sacs': ok([]),
  'GET /api/projects/p1/pairings': ok([]),
  'GET /api/projects/p1/terms': ok({ versions: [] }),
  'GET /api/calendar/feed': ok({}),
});

describe('project page loader', () => {
  it('loads the terms for a partner, with the project and its other panels', async () => {
    const asked = await pathsAsked(projectLoader, { projectId: 'p1' }, projectRoutes('partner'));
    expect(asked.sort()).toEqual([
      '/api/calendar/feed',
      '/api/projects/p1',
      '/api/projects/p1/activity',
      '/api/projects/p1/pairings',
      '/api/projects/p1/sacs',
      '/api/projects/p1/terms',
    ]);
  });

  it('does not ask for the terms for a caretaker (the server would answer 403)', async () => {
    const asked = await pathsAsked(projectLoader, { projectId: 'p1' }, projectRoutes('caretaker'));
    expect(asked).toContain('/api/projects/p1');
    expect(asked).not.toContain('/api/projects/p1/terms');
  });
});

const sacRoutes = (opened: boolean) => ({
  'GET /api/sacs/s1': ok({ id: 's1', projectId: 'p1', opened }),
  'GET /api/sacs/s1/log': ok([]),
  'GET /api/sacs/s1/opening': ok({}),
  'GET /api/sacs/s1/counts': ok({}),
  'GET /api/projects/p1': ok({ id: 'p1', myRole: 'owner' }),
});

describe('sac page loader', () => {
  it('asks for neither the opening nor the brood of a sac not yet opened (there is none: 404)', async () => {
    const asked = await pathsAsked(sacLoader, { sacId: 's1' }, sacRoutes(false));
    expect(asked.sort()).toEqual(['/api/projects/p1', '/api/sacs/s1', '/api/sacs/s1/log']);
  });

  it('loads the opening and the brood once the sac is opened, and the project without waiting for the page', async () => {
    const asked = await pathsAsked(sacLoader, { sacId: 's1' }, sacRoutes(true));
    expect(asked.sort()).toEqual(['/api/projects/p1', '/api/sacs/s1', '/api/sacs/s1/counts', '/api/sacs/s1/log', '/api/sacs/s1/opening']);
  });
});
