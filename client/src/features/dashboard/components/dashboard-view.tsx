import { Anchor, Badge, Group, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { MALE_CLOCK_LABELS, PROJECT_STAGE_LABELS, type DashboardResponse, type DashboardSac, type RollStatus } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { formatDate, formatInstant } from '@/lib/dates';
import { MALE_CLOCK_TONE, ROLL_STATUS_TONE } from '@/lib/tones';
import { SectionCard } from '@/components/ui/section-card';

const ROLL_LABEL: Record<RollStatus, string> = { overdue: 'Overdue', due: 'Due now', 'due-soon': 'Due within the hour', upcoming: 'Later' };

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
        <SectionCard compact title="Rolls" testId="card-rolls" accent={overdue ? 'clay' : rolls.length ? 'amber' : undefined}>
          {rolls.length === 0 ? (
            <Text size="sm" c="dimmed">
              No roll is due.
            </Text>
          ) : (
            rolls.map((r) => {
              const s = { label: ROLL_LABEL[r.sac.roll!.status], ...ROLL_STATUS_TONE[r.sac.roll!.status] };
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
        </SectionCard>
        <SectionCard
          compact
          title="Pull windows today"
          testId="card-pull-today"
          accent={pullWindows.some((p) => p.event === 'closes-today') ? 'clay' : pullWindows.length ? 'amber' : undefined}
        >
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
        </SectionCard>
      </SimpleGrid>
      {nothingDue && (
        <Text size="sm" className="tone-ok">
          Nothing needs doing right now.
        </Text>
      )}

      <SimpleGrid cols={{ base: 1, md: 2 }}>
        <SectionCard compact title="Upcoming pull windows (30 days)" testId="card-upcoming">
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
        </SectionCard>
        <SectionCard compact title="Open projects" testId="card-projects">
          {data.openProjects.length === 0 ? (
            <Text size="sm" c="dimmed">
              No open project.{' '}
              <Anchor component={Link} to={paths.newProject.href()}>
                Start one
              </Anchor>
              .
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
        </SectionCard>
        <SectionCard compact title="Mature males" testId="card-males">
          {data.matureMales.length === 0 ? (
            <Text size="sm" c="dimmed">
              No mature male in your collection.
            </Text>
          ) : (
            <Table verticalSpacing={4} fz="sm">
              <Table.Tbody>
                {data.matureMales.slice(0, 8).map((m) => {
                  const c = { ...MALE_CLOCK_LABELS[m.clock.state], ...MALE_CLOCK_TONE[m.clock.state] };
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
        </SectionCard>
        <SectionCard compact title="From your partners" testId="card-activity">
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
        </SectionCard>
      </SimpleGrid>
    </Stack>
  );
}
