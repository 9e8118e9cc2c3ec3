import { Alert, List, Stack, Text } from '@mantine/core';
import { groupCautionAlwaysShown, type SpeciesResponse } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { useSourceLabel } from '../utils/species-view';

type CautionSpecies = Pick<SpeciesResponse, 'scientificName' | 'group' | 'cautions' | 'tradeListing'>;

/**
 * True when a species has anything a keeper should be warned about. An Old World (or burrowing)
 * species always has: its group's caution shows whatever its own venom flag says.
 */
export function hasCautions(species: CautionSpecies): boolean {
  return (
    species.cautions.urticatingHairs.value ||
    species.cautions.venom.value !== 'no-cases-known' ||
    Boolean(species.tradeListing.value) ||
    groupCautionAlwaysShown(species.group)
  );
}

/**
 * The safety and trade notice of a species: urticating hairs, what is known of its venom, a
 * protected-trade listing and its group's caution, each with the usual cautions, and always the
 * deference to local law.
 */
export function CautionNotice({ species }: { species: CautionSpecies }) {
  const t = useWords();
  const sourceLabel = useSourceLabel();
  if (!hasCautions(species)) return null;
  const { urticatingHairs, venom } = species.cautions;
  const significant = venom.value === 'medically-significant';
  const notKnown = venom.value === 'not-known';
  const listing = species.tradeListing.value;
  const what = [
    urticatingHairs.value && t('page.species.caution.whatHairs'),
    significant && t('page.species.caution.whatVenom'),
    notKnown && t('page.species.caution.whatVenomNotKnown'),
    listing && t('page.species.caution.whatListing'),
  ].filter(Boolean);
  const source = (s: SpeciesResponse['tradeListing']['source']) => (
    <Text span size="xs" fs="italic">
      {t('page.species.sourceInBrackets', { source: sourceLabel(s) })}
    </Text>
  );
  return (
    <Alert
      role="note"
      variant="light"
      color={significant ? 'clay' : 'amber'}
      title={
        <Text component="span" fw={700} className={significant ? 'tone-failed' : 'tone-due'}>
          {t('page.species.caution.title', { what: (what.length ? what : [t('page.species.caution.whatGroup')]).join(', ') })}
        </Text>
      }
    >
      <Stack gap="xs">
        {what.length > 0 && (
          <List size="sm" spacing={4}>
            {urticatingHairs.value && (
              <List.Item>
                <b>{t('page.species.caution.hairsHead')}</b> {t('page.species.caution.hairs')} {source(urticatingHairs.source)}
              </List.Item>
            )}
            {significant && (
              <List.Item>
                <b>{t('page.species.caution.venomHead')}</b> {t('page.species.caution.venom')} {source(venom.source)}
              </List.Item>
            )}
            {notKnown && (
              <List.Item>
                <b>{t('page.species.caution.venomNotKnownHead')}</b> {t('safety.venomNotKnown')} {source(venom.source)}
              </List.Item>
            )}
            {listing && (
              <List.Item>
                <b>{listing}.</b> {t('page.species.caution.listing')} {source(species.tradeListing.source)}
              </List.Item>
            )}
          </List>
        )}
        <Text size="sm">{t('page.species.caution.venomFlag', { flag: t(`venom.${venom.value}`) })}</Text>
        <Text size="sm">
          <b>{t('page.species.caution.aboutGroup')}</b> {t(`safety.groupCaution.${species.group}`)}
        </Text>
        <Text size="sm" fw={600}>
          {t('page.species.caution.law')}
        </Text>
      </Stack>
    </Alert>
  );
}
