import { useMutation } from '@tanstack/react-query';
import type { CreateProjectRequest, InvitableRole, ProjectResponse, ProposeTermsRequest, TermsLineInput } from '@broodsilk/shared';
import { addProjectMember, createProject, projectQueries } from '../api/projects';
import { sendInvitation } from '../api/invitations';
import { proposeTerms } from '../api/terms';
import { words } from '@/lib/i18n';

export interface NewParty {
  name: string;
  email: string | null;
  role: InvitableRole;
  invite: boolean;
  terms: Omit<TermsLineInput, 'memberId'>;
}

export interface NewProjectInput {
  project: CreateProjectRequest;
  parties: NewParty[];
  /** The keeper's own line and the project-wide terms; absent to leave terms for later. */
  terms: (Omit<ProposeTermsRequest, 'lines'> & { ownerLine: Omit<TermsLineInput, 'memberId'> }) | null;
}

export interface NewProjectResult {
  project: ProjectResponse;
  /** What did not go through after the project itself was created (the project page can finish it). */
  problems: string[];
}

/**
 * Creates a project, then its parties (with invitations) and its first terms. The project is the
 * only step that can refuse the form; later failures are reported but keep the project.
 */
export function useCreateProject() {
  return useMutation({
    // The new project's own page is not cached yet; the list is.
    meta: { handlesErrors: true, invalidates: [projectQueries.list().queryKey] },
    mutationFn: async (input: NewProjectInput): Promise<NewProjectResult> => {
      const project = await createProject(input.project);
      const problems: string[] = [];
      const lines: TermsLineInput[] = [];
      const owner = project.members.find((m) => m.role === 'owner');
      if (owner && input.terms) lines.push({ memberId: owner.id, ...input.terms.ownerLine });
      for (const party of input.parties) {
        try {
          const member = await addProjectMember(project.id, { name: party.name, email: party.email, role: party.role });
          if (party.role === 'partner') lines.push({ memberId: member.id, ...party.terms });
          if (party.invite && party.email) {
            try {
              await sendInvitation(project.id, { email: party.email, role: party.role, memberId: member.id });
            } catch (e) {
              problems.push(words('page.projects.newProject.invitationNotSent', { email: party.email, reason: (e as Error).message }));
            }
          }
        } catch (e) {
          problems.push(words('page.projects.newProject.partyNotAdded', { name: party.name, reason: (e as Error).message }));
        }
      }
      if (input.terms) {
        const { ownerLine: _ownerLine, ...deal } = input.terms;
        try {
          await proposeTerms(project.id, { ...deal, lines });
        } catch (e) {
          problems.push(words('page.projects.newProject.termsNotSaved', { reason: (e as Error).message }));
        }
      }
      return { project, problems };
    },
  });
}
