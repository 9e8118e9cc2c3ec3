import { ProjectMember } from '../../../src/projects/project-member.entity';
import { OWNER_ONLY, type MatrixFixture, type MatrixRow } from './matrix.types';

let n = 0;

/** An outside party (no account) of the shared project, straight in the database: progress links are for them. */
async function outsideParty(fx: MatrixFixture): Promise<string> {
  const em = fx.orm.em.fork();
  const m = em.create(ProjectMember, { project: fx.project.id, user: null, role: 'partner', name: `Progress reader ${(n += 1)}`, email: null });
  await em.flush();
  return m.id;
}

export const rows: MatrixRow[] = [
  {
    method: 'POST',
    path: '/api/projects/:projectId/members/:memberId/progress-links',
    expect: OWNER_ONLY,
    request: async (fx) => ({ params: { memberId: await outsideParty(fx) } }),
  },
  {
    method: 'DELETE',
    path: '/api/projects/:projectId/members/:memberId/progress-links',
    expect: OWNER_ONLY,
    request: async (fx) => ({ params: { memberId: await outsideParty(fx) } }),
  },
];
