import { Image, List, SimpleGrid, Stack, Text, Timeline, Title } from '@mantine/core';
import { activityKindLabel, broodStageLabel, type ProgressSacView, type ProgressShareView, type ProgressView as View } from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { catalogueLabels, currentNumbering, useWords } from '@/lib/i18n';

/** What an outside party reads through their link: the pair, the stage, what happened, the sacs and their own share. */
export function ProgressView({ view, timeZone }: { view: View; timeZone: string }) {
  const t = useWords();
  const stages = catalogueLabels('projectStage');
  const reasons = catalogueLabels('endedEarly');
  const p = view.project;
  return (
    <Stack gap="lg" data-testid="progress-view">
      <Stack gap={4}>
        <Title order={2} size="h3">
          {p.title}
        </Title>
        <Text size="sm">{t('page.progress.female', { species: p.female.scientificName })}</Text>
        <Text size="sm">{t('page.progress.male', { species: p.male.scientificName })}</Text>
        <Text size="sm" fw={500}>
          {t('page.progress.stage', { stage: stages[p.stage] })}
          {p.endedEarlyReason && ` · ${t('endedEarlyWith', { reason: reasons[p.endedEarlyReason] })}`}
        </Text>
        {p.setback && (
          <Text size="sm" className="tone-due">
            {t('page.progress.setback', { reason: reasons[p.setback] })}
          </Text>
        )}
        <Text size="xs" c="dimmed">
          {t('page.progress.asOf', { when: formatInstant(view.generatedAt, timeZone) })}
        </Text>
      </Stack>
      <ShareSection share={view.share} />
      <Stack gap="xs">
        <Title order={2} size="h4">
          {t('page.progress.sacs')}
        </Title>
        {view.sacs.length === 0 ? (
          <Text c="dimmed">{t('page.progress.sacsEmpty')}</Text>
        ) : (
          view.sacs.map((s) => <SacSection key={s.id} sac={s} timeZone={timeZone} />)
        )}
      </Stack>
      <Stack gap="xs">
        <Title order={2} size="h4">
          {t('page.progress.timeline')}
        </Title>
        {view.timeline.length === 0 ? (
          <Text c="dimmed">{t('page.progress.timelineEmpty')}</Text>
        ) : (
          <Timeline bulletSize={12} lineWidth={2}>
            {view.timeline.map((e) => (
              <Timeline.Item key={e.id} color={e.kind.includes('fail') || e.kind.includes('end') ? 'clay' : 'moss'}>
                <Text size="sm">{activityKindLabel(t, e.kind)}</Text>
                <Text size="xs" c="dimmed">
                  {formatInstant(e.at, timeZone)}
                </Text>
              </Timeline.Item>
            ))}
          </Timeline>
        )}
      </Stack>
    </Stack>
  );
}

function ShareSection({ share }: { share: ProgressShareView }) {
  const t = useWords();
  const clauses = catalogueLabels('failureClause');
  return (
    <Stack gap={4} data-testid="progress-share">
      <Title order={2} size="h4">
        {t('page.progress.share')}
      </Title>
      {!share.termsInForce ? (
        <Text size="sm">{t('page.progress.shareNoTerms')}</Text>
      ) : (
        <>
          <Text size="sm" fw={500}>
            {t(share.provisional ? 'page.progress.shareTotalAbout' : 'page.progress.shareTotal', { count: share.total })}
          </Text>
          <List size="sm">
            {share.sacs.map((s) => (
              <List.Item key={s.sacId}>
                {t(s.failed ? 'page.progress.sacShareFailed' : 'page.progress.sacShare', { date: s.layDate, count: s.count })}
              </List.Item>
            ))}
          </List>
          <Text size="sm">{t('page.progress.handedOver', { count: share.handedOver })}</Text>
          <Text size="sm">{t('page.progress.stillOwed', { count: share.stillOwed })}</Text>
          {share.failureClause && <Text size="sm">{t('page.progress.ifFails', { clause: clauses[share.failureClause] })}</Text>}
          {share.provisional && (
            <Text size="xs" c="dimmed">
              {t('page.progress.provisional')}
            </Text>
          )}
        </>
      )}
    </Stack>
  );
}

function SacSection({ sac, timeZone }: { sac: ProgressSacView; timeZone: string }) {
  const t = useWords();
  const outcomes = catalogueLabels('sacOutcome');
  const failures = catalogueLabels('sacFailure');
  return (
    <Stack gap={4} data-testid="progress-sac">
      <Text size="sm" fw={500}>
        {t('page.progress.sacLaid', { date: sac.layDate })}
      </Text>
      <Text size="sm">
        {sac.outcome === 'failed' && sac.failureReason
          ? t('page.progress.failure', { reason: failures[sac.failureReason] })
          : t('page.progress.outcome', { outcome: outcomes[sac.outcome] })}
      </Text>
      {sac.pulledOn && <Text size="sm">{t('page.progress.pulledOn', { date: sac.pulledOn })}</Text>}
      {sac.openedAt ? (
        <Text size="sm">{t('page.progress.openedAt', { when: formatInstant(sac.openedAt, timeZone) })}</Text>
      ) : (
        <Text size="sm" c="dimmed">
          {t('page.progress.notOpened')}
        </Text>
      )}
      <Text size="sm">{t('page.progress.broodStage', { stage: broodStageLabel(t, sac.broodStage, currentNumbering()) })}</Text>
      {sac.currentCount !== null && (
        <Text size="sm">{t(sac.currentCountEstimated ? 'page.progress.aliveAbout' : 'page.progress.alive', { count: sac.currentCount })}</Text>
      )}
      {sac.photos.length > 0 && (
        <SimpleGrid cols={{ base: 2, sm: 3 }} spacing="xs">
          {sac.photos.map((ph) => (
            <a key={ph.id} href={ph.url} target="_blank" rel="noreferrer">
              <Image src={ph.thumbUrl} alt={t('page.progress.photoAlt', { date: sac.layDate })} radius="sm" />
            </a>
          ))}
        </SimpleGrid>
      )}
    </Stack>
  );
}
