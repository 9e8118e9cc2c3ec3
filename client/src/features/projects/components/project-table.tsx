import { Anchor, Table, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { ProjectSummary } from '@broodsilk/shared';
import { formatDate } from '@/lib/dates';
import { useWords } from '@/lib/i18n';
import { StageBadge } from './stage-line';

interface ProjectTableProps {
  projects: ProjectSummary[];
  projectHref: (id: string) => string;
  /** What comes next for a project (pull window, roll, terms to accept), when the page knows it. */
  nextDue?: (p: ProjectSummary) => string | null;
}

/** Projects as a dense table; on a phone the animals and partners fold under the title. */
export function ProjectTable({ projects, projectHref, nextDue }: ProjectTableProps) {
  const t = useWords();
  if (projects.length === 0) return <Text c="dimmed">{t('page.projects.list.none')}</Text>;
  return (
    <Table.ScrollContainer minWidth={360}>
      <Table striped highlightOnHover verticalSpacing="xs" data-testid="project-table">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>{t('page.projects.list.project')}</Table.Th>
            <Table.Th visibleFrom="sm">{t('page.projects.list.pair')}</Table.Th>
            <Table.Th>{t('page.projects.list.stage')}</Table.Th>
            <Table.Th visibleFrom="sm">{t('page.projects.list.people')}</Table.Th>
            <Table.Th visibleFrom="md">{t('page.projects.list.next')}</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {projects.map((p) => (
            <Table.Tr key={p.id}>
              <Table.Td>
                <Anchor component={Link} to={projectHref(p.id)} fw={600}>
                  {p.title}
                </Anchor>
                <Text size="xs" c="dimmed" hiddenFrom="sm">
                  {p.female.label} × {p.male.label}
                </Text>
                {p.myRole !== 'owner' && (
                  <Text size="xs" c="dimmed">
                    {t(p.myRole === 'partner' ? 'page.projects.list.youArePartner' : 'page.projects.list.youAreCaretaker')}
                  </Text>
                )}
              </Table.Td>
              <Table.Td visibleFrom="sm">
                <Text size="sm">
                  {p.female.label} × {p.male.label}
                </Text>
                <Text size="xs" c="dimmed" fs="italic">
                  {p.female.scientificName === p.male.scientificName ? p.female.scientificName : `${p.female.scientificName} × ${p.male.scientificName}`}
                </Text>
              </Table.Td>
              <Table.Td>
                <StageBadge stage={p.stage} />
                {p.endedOn && (
                  <Text size="xs" c="dimmed">
                    {formatDate(p.endedOn)}
                  </Text>
                )}
              </Table.Td>
              <Table.Td visibleFrom="sm">
                <Text size="sm">{p.owner.name}</Text>
                <Text size="xs" c="dimmed">
                  {p.partners.length ? t('page.projects.list.withPartners', { names: p.partners.join(', ') }) : t('page.projects.list.noPartner')}
                </Text>
              </Table.Td>
              <Table.Td visibleFrom="md">
                <Text size="sm">{nextDue?.(p) ?? '—'}</Text>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
