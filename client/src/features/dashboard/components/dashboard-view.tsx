import { SimpleGrid, Stack, Text } from '@mantine/core';
import type { DashboardResponse, TemperatureUnit } from '@broodsilk/shared';
import { RollsCard } from './rolls-card';
import { PullTodayCard } from './pull-today-card';
import { AccountTodosCard } from './account-todos-card';
import { UpcomingCard } from './upcoming-card';
import { ProjectsCard } from './projects-card';
import { MalesCard } from './males-card';
import { ActivityCard } from './activity-card';
import { ReadingsCard } from './readings-card';
import { useWords } from '@/lib/i18n';

/** Whether Today has anything to do for the viewer: every kind of to-do counts. */
export function nothingToDo(due: DashboardResponse['dueToday']): boolean {
  return [due.rolls, due.pullWindows, due.readings, due.termsToAccept, due.handOversToConfirm, due.payments].every((list) => list.length === 0);
}

/** The home page's cards: what needs doing now first, then what is coming and what others did. */
export function DashboardView({ data, timeZone, temperatureUnit = 'C' }: { data: DashboardResponse; timeZone: string; temperatureUnit?: TemperatureUnit }) {
  const t = useWords();
  return (
    <Stack>
      <ReadingsCard readings={data.dueToday.readings} temperatureUnit={temperatureUnit} />
      <SimpleGrid cols={{ base: 1, md: 3 }}>
        <RollsCard rolls={data.dueToday.rolls} timeZone={timeZone} />
        <PullTodayCard pullWindows={data.dueToday.pullWindows} />
        <AccountTodosCard todos={data.dueToday} />
      </SimpleGrid>
      {nothingToDo(data.dueToday) && (
        <Text size="sm" className="tone-ok">
          {t('page.dashboard.nothingToDo')}
        </Text>
      )}
      <SimpleGrid cols={{ base: 1, md: 2 }}>
        <UpcomingCard upcoming={data.upcomingPullWindows} />
        <ProjectsCard projects={data.openProjects} count={data.openProjectCount} />
        <MalesCard males={data.matureMales} count={data.matureMaleCount} />
        <ActivityCard events={data.recentActivity} timeZone={timeZone} />
      </SimpleGrid>
    </Stack>
  );
}
