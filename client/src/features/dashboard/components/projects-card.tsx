import { Anchor, Badge, Table, Text } from '@mantine/core';
import { Link } from 'react-router';
import type { ProjectSummary } from '@broodsilk/shared';
import { catalogueLabels } from '@/lib/i18n';

const PROJECT_STAGE_LABELS = catalogueLabels('projectStage');
import { paths } from '@/config/paths';
import { SectionCard } from '@/components/ui/section-card';
import { useWords } from '@/lib/i18n';

/** The newest projects not closed or ended early, with their stage; the projects page has them all. */
export function ProjectsCard({ projects, count }: { projects: ProjectSummary[]; count: number }) {
  const t = useWords();
  return (
    <SectionCard compact title={t('page.dashboard.projects.title')} testId="card-projects">
      {projects.length === 0 ? (
        <Text size="sm" c="dimmed">
          {t('page.dashboard.projects.none')}{' '}
          <Anchor component={Link} to={paths.newProject.href()}>
            {t('page.dashboard.projects.start')}
          </Anchor>
        </Text>
      ) : (
        <Table verticalSpacing={4} fz="sm">
          <Table.Tbody>
            {projects.map((p) => (
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
      {count > projects.length && (
        <Anchor component={Link} to={paths.projects.href()} size="sm" mt="xs" display="inline-block">
          {t('page.dashboard.projects.all', { count })}
        </Anchor>
      )}
    </SectionCard>
  );
}
