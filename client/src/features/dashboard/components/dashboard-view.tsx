import { Anchor, Badge, Card, Group, SimpleGrid, Stack, Table, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { MALE_CLOCK_LABELS, PROJECT_STAGE_LABELS, type DashboardResponse, type DashboardSac, type MaleClockState, type RollStatus } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatDate, formatInstant } from '@/lib/dates';

const ROLL: Record<RollStatus, { label: string; tone: string; colour: string }> = {
  overdue: { label: 'Overdue', tone: 'tone-failed', colour: 'clay' },
  due: { label: 'Due now', tone: 'tone-due', colour: 'amber' },
  'due-soon': { label: 'Due within the hour', tone: 'tone-due', colour: 'amber' },
  upcoming: { label: 'Later', tone: '', colour: 'gray' },
};

const CLOCK_TONE: Record<MaleClockState, string> = { fresh: 'tone-ok', prime: 'tone-ok', late: 'tone-due', 'past-typical': 'tone-failed' };

function Panel({ title, children, testId, accent }: { title: string; children: ReactNode; testId: string; accent?: 'amber' | 'clay' }) {
  return (
    <Card withBorder data-testid={testId} style={accent ? { borderLeft: `6px solid var(--mantine-color-${accent}-5)` } : undefined}>
      <Title order={3} size="h5" mb="xs">
        {title}
      </Title>
      {children}
    </Card>
  );
}

function SacLine({ item, right }: { item: DashboardSac; right: ReactNode }) {
  return (
    <Group justify="space-between" wrap="nowrap" gap="xs" py={4}>
      <Stack gap={0}>
        <Anchor component={Link} to={paths.sac.href(item.sac.id)} fw={600} size="sm">
          {item.projectTitle}
        </Anchor>
        <Text size="xs" c="dimmed">
          Day {item.sac.dayNumber} · laid {formatDate(item.sac.layDate)}
        </Text>
      </Stack>
      {right}
    </Group>
  );
}

/** The home page's cards: what needs doing now first, then what is coming and what others did. */
export function DashboardView({ data, timeZone }: { data: DashboardResponse; timeZone: string }) {
  const { rolls, pullWindows } = data.dueToday;
  const overdue = rolls.some((r) => r.sac.roll?.status === 'overdue');
  const nothingDue = rolls.length === 0 && pullWindows.length === 0;
  return (
    <Stack>
      <SimpleGrid cols={{ base: 1, md: 2 }}>
        <Panel title="Rolls" testId="card-rolls" accent={overdue ? 'clay' : rolls.length ? 'amber' : undefined}>
          {rolls.length === 0 ? (
            <Text size="sm" c="dimmed">
              No roll is due.
            </Text>
          ) : (
            rolls.map((r) => {
              const s = ROLL[r.sac.roll!.status];
              return (
                <SacLine
                  key={r.sac.id}
                  item={r}
                  right={
                    <Stack gap={0} align="flex-end">
                      <Text size="sm" fw={700} className={s.tone} data-testid="roll-status">
                        {s.label}
                      </Text>
                      <Text size="xs" c="dimmed">
                        {formatInstant(r.sac.roll!.due, timeZone)}
                      </Text>
                      <Anchor component={Link} to={paths.incubatorSac.href(r.sac.id)} size="sm">
                        Log a roll
                      </Anchor>
                    </Stack>
                  }
                />
              );
            })
          )}
        </Panel>
        <Panel title="Pull windows today" testId="card-pull-today" accent={pullWindows.some((p) => p.event === 'closes-today') ? 'clay' : pullWindows.length ? 'amber' : undefined}>
          {pullWindows.length === 0 ? (
            <Text size="sm" c="dimmed">
              No window opens or closes today.
            </Text>
          ) : (
            pullWindows.map((p) => (
              <SacLine
                key={p.sac.id}
                item={p}
                right={
                  <Text size="sm" fw={700} className={p.event === 'closes-today' ? 'tone-failed' : 'tone-due'}>
                    {p.event === 'closes-today' ? 'Closes today' : 'Opens today'}
                  </Text>
                }
              />
            ))
          )}
        </Panel>
      </SimpleGrid>
      {nothingDue && (
        <Text size="sm" className="tone-ok">
          Nothing needs doing right now.
        </Text>
      )}

      <SimpleGrid cols={{ base: 1, md: 2 }}>
        <Panel title="Upcoming pull windows (30 days)" testId="card-upcoming">
          {data.upcomingPullWindows.length === 0 ? (
            <Text size="sm" c="dimmed">
              None in the next 30 days.
            </Text>
          ) : (
            <Table verticalSpacing={4} fz="sm">
              <Table.Tbody>
                {data.upcomingPullWindows.map((u) => {
                  const w = u.sac.pullWindow;
                  const open = w.state === 'open' || w.state === 'closing';
                  return (
                    <Table.Tr key={u.sac.id}>
                      <Table.Td>
                        <Anchor component={Link} to={paths.sac.href(u.sac.id)} size="sm" fw={600}>
                          {u.projectTitle}
                        </Anchor>
                        <Text size="xs" c="dimmed">
                          day {u.sac.dayNumber}
                        </Text>
                      </Table.Td>
                      <Table.Td>
                        <Text size="sm" className={w.state === 'closing' ? 'tone-due' : open ? 'tone-ok' : undefined} data-testid="upcoming-state">
                          {w.state === 'closing' ? 'Closing' : open ? 'Open now' : `Opens in ${w.daysUntilOpens} d`}
                        </Text>
                      </Table.Td>
                      <Table.Td>
                        <Text size="xs" c="dimmed">
                          {formatDate(w.opensOn)} – {formatDate(w.closesOn)}
                        </Text>
                      </Table.Td>
                    </Table.Tr>
                  );
                })}
              </Table.Tbody>
            </Table>
          )}
        </Panel>
        <Panel title="Open projects" testId="card-projects">
          {data.openProjects.length === 0 ? (
            <Text size="sm" c="dimmed">
              No open project. <Anchor component={Link} to={paths.newProject.href()}>Start one</Anchor>.
            </Text>
          ) : (
            <Table verticalSpacing={4} fz="sm">
              <Table.Tbody>
                {data.openProjects.map((p) => (
                  <Table.Tr key={p.id}>
                    <Table.Td>
                      <Anchor component={Link} to={paths.project.href(p.id)} size="sm" fw={600}>
                        {p.title}
                      </Anchor>
                      <Text size="xs" c="dimmed">
                        {p.female.label} × {p.male.label}
                      </Text>
                    </Table.Td>
                    <Table.Td style={{ width: '1%', whiteSpace: 'nowrap' }}>
                      <Badge variant="light" tt="none" color={p.stage.stage === 'ended-early' ? 'clay' : 'moss'} styles={{ label: { overflow: 'visible' } }}>
                        {PROJECT_STAGE_LABELS[p.stage.stage]}
                      </Badge>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          )}
        </Panel>
        <Panel title="Mature males" testId="card-males">
          {data.matureMales.length === 0 ? (
            <Text size="sm" c="dimmed">
              No mature male in your collection.
            </Text>
          ) : (
            <Table verticalSpacing={4} fz="sm">
              <Table.Tbody>
                {data.matureMales.slice(0, 8).map((m) => {
                  const c = { ...MALE_CLOCK_LABELS[m.clock.state], tone: CLOCK_TONE[m.clock.state] };
                  return (
                    <Table.Tr key={m.animal.id}>
                      <Table.Td>
                        <Text size="sm" fw={600}>
                          {m.animal.label}
                        </Text>
                        <Text size="xs" c="dimmed" fs="italic">
                          {m.animal.species.scientificName}
                        </Text>
                      </Table.Td>
                      <Table.Td>
                        <Text size="sm" className={c.tone}>
                          {c.label}
                        </Text>
                      </Table.Td>
                      <Table.Td>
                        <Text size="xs" c="dimmed">
                          day {m.clock.daysSinceMaturing}
                          {m.clock.daysUntilPastTypical > 0 ? ` · ${m.clock.daysUntilPastTypical} d left` : ''}
                        </Text>
                      </Table.Td>
                    </Table.Tr>
                  );
                })}
              </Table.Tbody>
            </Table>
          )}
        </Panel>
        <Panel title="From your partners" testId="card-activity">
          {data.recentActivity.length === 0 ? (
            <Text size="sm" c="dimmed">
              Nothing new from others.
            </Text>
          ) : (
            <Stack gap={6}>
              {data.recentActivity.slice(0, 8).map((e) => (
                <div key={e.id}>
                  <Text size="sm">
                    <b>{e.actor?.name ?? 'Broodsilk'}</b>: {e.summary}
                  </Text>
                  <Text size="xs" c="dimmed">
                    <Anchor component={Link} to={paths.project.href(e.projectId)} size="xs">
                      {e.projectTitle}
                    </Anchor>{' '}
                    · {formatInstant(e.at, timeZone)}
                  </Text>
                </div>
              ))}
            </Stack>
          )}
        </Panel>
      </SimpleGrid>
    </Stack>
  );
}
