import { Badge, Button, Checkbox, Collapse, Group, Select, Stack, Text } from '@mantine/core';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { TEXT_LIMITS, type InvitableRole, type InvitationResponse, type ProjectMemberResponse, type ProjectRole } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { applyServerErrors } from '@/lib/form-errors';
import { useAddProjectMember } from '../api/projects';
import { useSendInvitation } from '../api/invitations';
import { ROLE_LABELS } from '../utils/labels';
import { FormActions } from '@/components/ui/form-actions';
import { PartyTable } from '@/components/ui/party-table';
import { ProgressLinkActions } from './progress-link-actions';

interface PartiesPanelProps {
  projectId: string;
  members: ProjectMemberResponse[];
  myRole: ProjectRole;
  timeZone: string;
}

interface MemberAccountProps {
  member: ProjectMemberResponse;
  invitation: InvitationResponse | undefined;
  timeZone: string;
  sending: boolean;
  onInvite: () => void;
}

/** For the keeper: whether a party has joined, or an invitation to send them. */
function MemberAccount({ member: m, invitation, timeZone, sending, onInvite }: MemberAccountProps) {
  const t = useWords();
  if (m.role === 'owner')
    return (
      <Text size="xs" c="dimmed">
        {t('page.projects.parties.you')}
      </Text>
    );
  if (m.hasAccount)
    return (
      <Badge variant="light" color="moss" tt="none">
        {t('page.projects.parties.joined')}
      </Badge>
    );
  if (!m.email)
    return (
      <Text size="xs" c="dimmed">
        {t('page.projects.parties.noEmail')}
      </Text>
    );
  return (
    <Group gap={6} wrap="nowrap">
      {invitation && (
        <Text size="xs" className="tone-due">
          {t('page.projects.parties.sentUntil', { when: formatInstant(invitation.expiresAt, timeZone) })}
        </Text>
      )}
      <Button size="compact-xs" variant={invitation ? 'subtle' : 'light'} loading={sending} onClick={onInvite}>
        {t(invitation ? 'page.projects.parties.sendAgain' : 'page.projects.parties.send')}
      </Button>
    </Group>
  );
}

/** The parties with their roles; the keeper adds one and invites them by e-mail. */
export function PartiesPanel({ projectId, members, myRole, timeZone }: PartiesPanelProps) {
  const t = useWords();
  const isOwner = myRole === 'owner';
  const send = useSendInvitation(projectId);
  // The server keeps no list of invitations for the page; what was sent from here is shown until reload.
  const [sent, setSent] = useState<Record<string, InvitationResponse>>({});
  const invite = (m: ProjectMemberResponse) =>
    send.mutate({ email: m.email!, role: m.role as InvitableRole, memberId: m.id }, { onSuccess: (inv) => setSent((s) => ({ ...s, [m.id]: inv })) });

  return (
    <Stack>
      <PartyTable
        label={t('page.projects.parties.label')}
        minWidth={300}
        small
        testId="parties-table"
        rows={members}
        rowKey={(m) => m.id}
        columns={[
          {
            header: t('page.projects.party'),
            cell: (m) => (
              <>
                <Text size="sm" fw={500}>
                  {m.name}
                </Text>
                {m.email && (
                  <Text size="xs" c="dimmed">
                    {m.email}
                  </Text>
                )}
                <Text size="xs" c="dimmed" hiddenFrom="sm">
                  {ROLE_LABELS[m.role]}
                </Text>
              </>
            ),
          },
          { header: t('page.projects.parties.role'), wide: true, cell: (m) => ROLE_LABELS[m.role] },
          ...(isOwner
            ? [
                {
                  header: t('page.projects.parties.account'),
                  cell: (m: ProjectMemberResponse) => (
                    <Stack gap={6}>
                      <MemberAccount
                        member={m}
                        invitation={sent[m.id]}
                        timeZone={timeZone}
                        sending={send.isPending && send.variables?.memberId === m.id}
                        onInvite={() => invite(m)}
                      />
                      {m.role !== 'owner' && !m.hasAccount && <ProgressLinkActions projectId={projectId} member={m} />}
                    </Stack>
                  ),
                },
              ]
            : []),
        ]}
      />
      {isOwner && <AddPartyForm projectId={projectId} />}
    </Stack>
  );
}

interface PartyValues {
  name: string;
  email: string;
  role: InvitableRole;
  invite: boolean;
}

function AddPartyForm({ projectId }: { projectId: string }) {
  const t = useWords();
  const [opened, { toggle, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const add = useAddProjectMember(projectId);
  const send = useSendInvitation(projectId);
  const form = useForm<PartyValues>({
    mode: 'uncontrolled',
    initialValues: { name: '', email: '', role: 'partner', invite: true },
    validate: {
      name: textRule({ required: t('page.projects.parties.nameRequired'), maxLength: TEXT_LIMITS.personName }),
      email: (v, values) => (values.invite && !/^\S+@\S+\.\S+$/.test(v.trim()) ? t('page.projects.parties.emailForInvitation') : null),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      const member = await add.mutateAsync({ name: v.name.trim(), email: v.email.trim() || null, role: v.role });
      if (v.invite && v.email.trim()) await send.mutateAsync({ email: v.email.trim(), role: v.role, memberId: member.id });
      form.reset();
      close();
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <Stack gap="xs">
      <Group>
        <Button variant="light" onClick={toggle}>
          {t(opened ? 'page.projects.parties.close' : 'page.projects.parties.add')}
        </Button>
      </Group>
      <Collapse expanded={opened}>
        <form onSubmit={submit} noValidate>
          <Stack maw={480}>
            <TextField
              label={t('page.projects.parties.name')}
              maxLength={TEXT_LIMITS.personName}
              withAsterisk
              key={form.key('name')}
              {...form.getInputProps('name')}
            />
            <TextField
              label={t('page.projects.parties.email')}
              type="email"
              maxLength={TEXT_LIMITS.email}
              key={form.key('email')}
              {...form.getInputProps('email')}
            />
            <Select
              label={t('page.projects.parties.role')}
              data={[
                { value: 'partner', label: t('page.projects.parties.partnerOption') },
                { value: 'caretaker', label: t('page.projects.parties.caretakerOption') },
              ]}
              allowDeselect={false}
              key={form.key('role')}
              {...form.getInputProps('role')}
            />
            <Checkbox label={t('page.projects.parties.invite')} key={form.key('invite')} {...form.getInputProps('invite', { type: 'checkbox' })} />
            <FormActions message={message} loading={add.isPending || send.isPending} submitLabel={t('page.projects.parties.submit')} />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}
