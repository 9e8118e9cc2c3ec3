import { Alert, Badge, Button, Checkbox, Collapse, Group, Select, Stack, Table, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import type { InvitableRole, ProjectMemberResponse, ProjectRole } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useAddProjectMember } from '../api/projects';
import { useProjectInvitations, useResendInvitation, useSendInvitation } from '../api/invitations';
import { ROLE_LABELS } from '../utils/labels';

interface PartiesPanelProps {
  projectId: string;
  members: ProjectMemberResponse[];
  myRole: ProjectRole;
  timeZone: string;
}

const roleOptions = [
  { value: 'partner', label: 'Partner (shares in the brood)' },
  { value: 'caretaker', label: 'Caretaker (rolls and logs)' },
];

/** The parties with their roles; the keeper adds one and invites them by e-mail. */
export function PartiesPanel({ projectId, members, myRole, timeZone }: PartiesPanelProps) {
  const isOwner = myRole === 'owner';
  const invitations = useProjectInvitations(projectId, isOwner);
  const send = useSendInvitation(projectId);
  const resend = useResendInvitation(projectId);
  const pendingFor = (m: ProjectMemberResponse) => invitations.data?.find((i) => i.memberId === m.id);

  return (
    <Stack>
      <Table.ScrollContainer minWidth={360}>
        <Table verticalSpacing={4} fz="sm" data-testid="parties-table">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Party</Table.Th>
              <Table.Th>Role</Table.Th>
              {isOwner && <Table.Th>Account</Table.Th>}
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {members.map((m) => {
              const invite = pendingFor(m);
              return (
                <Table.Tr key={m.id}>
                  <Table.Td>
                    <Text size="sm" fw={500}>
                      {m.name}
                    </Text>
                    {m.email && (
                      <Text size="xs" c="dimmed">
                        {m.email}
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>{ROLE_LABELS[m.role]}</Table.Td>
                  {isOwner && (
                    <Table.Td>
                      {m.hasAccount ? (
                        <Badge variant="light" color="moss" tt="none">
                          joined
                        </Badge>
                      ) : invite ? (
                        <Group gap={6} wrap="nowrap">
                          <Text size="xs" className="tone-due">
                            invited, until {formatInstant(invite.expiresAt, timeZone)}
                          </Text>
                          <Button size="compact-xs" variant="subtle" loading={resend.isPending} onClick={() => resend.mutate(invite.id)}>
                            Resend
                          </Button>
                        </Group>
                      ) : m.email && m.role !== 'owner' ? (
                        <Button
                          size="compact-xs"
                          variant="light"
                          loading={send.isPending}
                          onClick={() => send.mutate({ email: m.email!, role: m.role as InvitableRole, memberId: m.id })}
                        >
                          Invite to join
                        </Button>
                      ) : (
                        <Text size="xs" c="dimmed">
                          {m.role === 'owner' ? '—' : 'no e-mail, kept on record only'}
                        </Text>
                      )}
                    </Table.Td>
                  )}
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      {isOwner && invitations.data && invitations.data.some((i) => !i.memberId) && (
        <Stack gap={4}>
          <Text size="sm" fw={600}>
            Open invitations
          </Text>
          {invitations.data
            .filter((i) => !i.memberId)
            .map((i) => (
              <Group key={i.id} gap="xs">
                <Text size="sm">
                  {i.email} · {ROLE_LABELS[i.role]}
                </Text>
                <Button size="compact-xs" variant="subtle" onClick={() => resend.mutate(i.id)}>
                  Resend
                </Button>
              </Group>
            ))}
        </Stack>
      )}
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
  const [opened, { toggle, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const add = useAddProjectMember(projectId);
  const send = useSendInvitation(projectId);
  const form = useForm<PartyValues>({
    mode: 'uncontrolled',
    initialValues: { name: '', email: '', role: 'partner', invite: true },
    validate: {
      name: (v) => (v.trim() ? null : 'Give the party a name.'),
      email: (v, values) => (values.invite && !/^\S+@\S+\.\S+$/.test(v.trim()) ? 'An invitation needs an e-mail address.' : null),
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
          {opened ? 'Close' : 'Add a party'}
        </Button>
      </Group>
      <Collapse expanded={opened}>
        <form onSubmit={submit} noValidate>
          <Stack maw={480}>
            <TextInput label="Name" withAsterisk key={form.key('name')} {...form.getInputProps('name')} />
            <TextInput label="E-mail" type="email" key={form.key('email')} {...form.getInputProps('email')} />
            <Select label="Role" data={roleOptions} allowDeselect={false} key={form.key('role')} {...form.getInputProps('role')} />
            <Checkbox label="E-mail an invitation to join this project in Broodsilk" key={form.key('invite')} {...form.getInputProps('invite', { type: 'checkbox' })} />
            {message && (
              <Alert color="clay" role="alert">
                {message}
              </Alert>
            )}
            <Group>
              <Button type="submit" loading={add.isPending || send.isPending}>
                Add party
              </Button>
            </Group>
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}
