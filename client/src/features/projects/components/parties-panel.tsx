import { Badge, Button, Checkbox, Collapse, Group, Select, Stack, Table, Text } from '@mantine/core';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { TEXT_LIMITS, type InvitableRole, type InvitationResponse, type ProjectMemberResponse, type ProjectRole } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useAddProjectMember } from '../api/projects';
import { useSendInvitation } from '../api/invitations';
import { ROLE_LABELS } from '../utils/labels';
import { FormActions } from '@/components/ui/form-actions';
import { ProgressLinkActions } from './progress-link-actions';

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
  const send = useSendInvitation(projectId);
  // The server keeps no list of invitations for the page; what was sent from here is shown until reload.
  const [sent, setSent] = useState<Record<string, InvitationResponse>>({});
  const invite = (m: ProjectMemberResponse) =>
    send.mutate({ email: m.email!, role: m.role as InvitableRole, memberId: m.id }, { onSuccess: (inv) => setSent((s) => ({ ...s, [m.id]: inv })) });

  return (
    <Stack>
      <Table.ScrollContainer minWidth={300}>
        <Table verticalSpacing={4} fz="sm" data-testid="parties-table">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Party</Table.Th>
              <Table.Th visibleFrom="sm">Role</Table.Th>
              {isOwner && <Table.Th>Account</Table.Th>}
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {members.map((m) => {
              const invitation = sent[m.id];
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
                    <Text size="xs" c="dimmed" hiddenFrom="sm">
                      {ROLE_LABELS[m.role]}
                    </Text>
                  </Table.Td>
                  <Table.Td visibleFrom="sm">{ROLE_LABELS[m.role]}</Table.Td>
                  {isOwner && (
                    <Table.Td>
                      <Stack gap={6}>
                        {m.role === 'owner' ? (
                          <Text size="xs" c="dimmed">
                            you
                          </Text>
                        ) : m.hasAccount ? (
                          <Badge variant="light" color="moss" tt="none">
                            joined
                          </Badge>
                        ) : m.email ? (
                          <Group gap={6} wrap="nowrap">
                            {invitation && (
                              <Text size="xs" className="tone-due">
                                sent, valid until {formatInstant(invitation.expiresAt, timeZone)}
                              </Text>
                            )}
                            <Button
                              size="compact-xs"
                              variant={invitation ? 'subtle' : 'light'}
                              loading={send.isPending && send.variables?.memberId === m.id}
                              onClick={() => invite(m)}
                            >
                              {invitation ? 'Send again' : 'Send invitation'}
                            </Button>
                          </Group>
                        ) : (
                          <Text size="xs" c="dimmed">
                            no e-mail, kept on record only
                          </Text>
                        )}
                        {m.role !== 'owner' && !m.hasAccount && <ProgressLinkActions projectId={projectId} member={m} />}
                      </Stack>
                    </Table.Td>
                  )}
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
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
      name: textRule({ required: 'Give the party a name.', maxLength: TEXT_LIMITS.personName }),
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
            <TextField label="Name" maxLength={TEXT_LIMITS.personName} withAsterisk key={form.key('name')} {...form.getInputProps('name')} />
            <TextField label="E-mail" type="email" maxLength={TEXT_LIMITS.email} key={form.key('email')} {...form.getInputProps('email')} />
            <Select label="Role" data={roleOptions} allowDeselect={false} key={form.key('role')} {...form.getInputProps('role')} />
            <Checkbox
              label="E-mail an invitation to join this project in Broodsilk"
              key={form.key('invite')}
              {...form.getInputProps('invite', { type: 'checkbox' })}
            />
            <FormActions message={message} loading={add.isPending || send.isPending} submitLabel="Add party" />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}
