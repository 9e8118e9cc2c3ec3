import { Alert, List, Stack, Text } from '@mantine/core';
import type { SpeciesResponse } from '@broodsilk/shared';
import { sourceLabel } from '../utils/species-view';

export const LAW_SENTENCE =
  'Follow the law where you live and licensed practice: where keeping, breeding, lending or shipping this species is regulated, those rules come before anything shown here.';

type CautionSpecies = Pick<SpeciesResponse, 'scientificName' | 'cautions' | 'tradeListing'>;

/** True when a species has anything a keeper should be warned about. */
export function hasCautions(species: CautionSpecies): boolean {
  return species.cautions.urticatingHairs.value || species.cautions.medicallySignificantVenom.value || Boolean(species.tradeListing.value);
}

/**
 * The safety and trade notice of a species: urticating hairs, medically significant venom and a
 * protected-trade listing, each with the usual cautions, and always the deference to local law.
 */
export function CautionNotice({ species }: { species: CautionSpecies }) {
  if (!hasCautions(species)) return null;
  const { urticatingHairs, medicallySignificantVenom } = species.cautions;
  const venom = medicallySignificantVenom.value;
  const listing = species.tradeListing.value;
  const title = [urticatingHairs.value && 'urticating hairs', venom && 'medically significant venom', listing && 'protected-trade listing']
    .filter(Boolean)
    .join(', ');
  return (
    <Alert
      role="note"
      variant="light"
      color={venom ? 'clay' : 'amber'}
      title={
        <Text component="span" fw={700} className={venom ? 'tone-failed' : 'tone-due'}>
          Take care: {title}
        </Text>
      }
    >
      <Stack gap="xs">
        <List size="sm" spacing={4}>
          {urticatingHairs.value && (
            <List.Item>
              <b>Urticating hairs.</b> Wear eye protection when working in the enclosure, do not rub your eyes, and wash your hands afterwards. Hairs in an eye
              need a doctor.{' '}
              <Text span size="xs" fs="italic">
                (Source: {sourceLabel(urticatingHairs.source)})
              </Text>
            </List.Item>
          )}
          {venom && (
            <List.Item>
              <b>Medically significant venom.</b> A bite can bring severe pain and muscle cramps lasting days. Work with tools rather than hands, keep the
              enclosure escape-proof, and seek medical help after a bite.{' '}
              <Text span size="xs" fs="italic">
                (Source: {sourceLabel(medicallySignificantVenom.source)})
              </Text>
            </List.Item>
          )}
          {listing && (
            <List.Item>
              <b>{listing}.</b> Selling, lending, shipping or breeding this species may need papers or permits; the rules of your country decide.{' '}
              <Text span size="xs" fs="italic">
                (Source: {sourceLabel(species.tradeListing.source)})
              </Text>
            </List.Item>
          )}
        </List>
        {species.cautions.cautionText && (
          <Text size="sm">
            <b>About its group:</b> {species.cautions.cautionText}
          </Text>
        )}
        <Text size="sm" fw={600}>
          {LAW_SENTENCE}
        </Text>
      </Stack>
    </Alert>
  );
}
