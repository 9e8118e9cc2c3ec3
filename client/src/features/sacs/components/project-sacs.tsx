import { Alert, Button, Collapse, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useProjectSacs } from '../api/sacs';
import { RecordSacForm } from './record-sac-form';
import { SacCard } from './sac-card';
import { useWords } from '@/lib/i18n';

interface ProjectSacsProps {
  projectId: string;
  timeZone: string;
  canRecord: boolean;
  sacHref: (id: string) => string;
  incubatorHref: (id: string) => string;
}

/** The sacs of one project, newest first, and the keeper's form to record a new one. */
export function ProjectSacs({ projectId, timeZone, canRecord, sacHref, incubatorHref }: ProjectSacsProps) {
  const t = useWords();
  const sacs = useProjectSacs(projectId);
  const [opened, { toggle, close }] = useDisclosure(false);
  return (
    <Stack>
      {sacs.isError && <Alert color="clay">{sacs.error.message}</Alert>}
      {sacs.data && sacs.data.length === 0 && <Text c="dimmed">{t('page.sacs.noSacYet')}</Text>}
      {sacs.data && sacs.data.length > 0 && (
        <SimpleGrid cols={{ base: 1, md: 2 }}>
          {[...sacs.data]
            .sort((a, b) => (a.layDate < b.layDate ? 1 : -1))
            .map((s) => (
              <SacCard key={s.id} sac={s} timeZone={timeZone} href={sacHref(s.id)} incubatorHref={s.roll ? incubatorHref(s.id) : undefined} />
            ))}
        </SimpleGrid>
      )}
      {canRecord && (
        <>
          <Group>
            <Button variant="light" onClick={toggle}>
              {opened ? t('page.sacs.close') : t('page.sacs.recordSac')}
            </Button>
          </Group>
          <Collapse expanded={opened}>
            <RecordSacForm projectId={projectId} timeZone={timeZone} onDone={close} />
          </Collapse>
        </>
      )}
    </Stack>
  );
}
