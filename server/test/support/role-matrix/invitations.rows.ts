import { Invitation } from '../../../src/invitations/invitation.entity';
import { newInvitationToken } from '../../../src/invitations/invitation-token';
import { User } from '../../../src/users/user.entity';
import { OWNER_ONLY, type MatrixFixture, type MatrixRow } from './matrix.types';

let n = 0;

/** An open invitation into `projectId`, written straight to the database; returns its token. */
async function invitation(fx: MatrixFixture, projectId: string, claimedBy?: string): Promise<{ token: string; id: string }> {
  const em = fx.orm.em.fork();
  const { token, hash } = newInvitationToken();
  const row = em.create(Invitation, {
    project: projectId,
    email: `matrix-invitee-${Date.now()}-${(n += 1)}@example.test`,
    role: 'caretaker',
    member: null,
    tokenHash: hash,
    invitedBy: em.getReference(User, fx.users.owner.user.id),
    expiresAt: new Date(Date.now() + 86_400_000),
    ...(claimedBy ? { claimedBy: em.getReference(User, claimedBy), claimedAt: new Date() } : {}),
  });
  await em.flush();
  return { token, id: row.id };
}

export const rows: MatrixRow[] = [
  {
    method: 'POST',
    path: '/api/projects/:projectId/invitations',
    expect: OWNER_ONLY,
    request: () => ({ body: { email: `matrix-${Date.now()}-${(n += 1)}@example.test`, role: 'caretaker' } }),
  },
  {
    method: 'GET',
    path: '/api/invitations/:token',
    // Public: the page shows what the link is before anybody signs in.
    expect: { anonymous: '2xx', stranger: '2xx', caretaker: '2xx', partner: '2xx', owner: '2xx' },
    request: async (fx) => ({ params: { token: (await invitation(fx, fx.project.id)).token } }),
  },
  {
    method: 'POST',
    path: '/api/invitations/:token/accept',
    // Anyone signed in holding the link asks to join (another address than the invited one waits for the owner); members get a 409.
    expect: { anonymous: 401, stranger: '2xx', caretaker: 409, partner: 409, owner: 409 },
    request: async (fx) => ({ params: { token: (await invitation(fx, (await fx.freshProject()).id)).token } }),
  },
  {
    method: 'POST',
    path: '/api/projects/:projectId/invitations/:invitationId/approve',
    expect: OWNER_ONLY,
    request: async (fx) => {
      const project = await fx.freshProject();
      return { params: { projectId: project.id, invitationId: (await invitation(fx, project.id, fx.users.stranger.user.id)).id } };
    },
  },
];
