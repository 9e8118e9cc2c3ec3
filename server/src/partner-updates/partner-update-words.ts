import {
  activityKindLabel,
  activitySentence,
  broodStageLabel,
  isBroodStage,
  label,
  type FailureClause,
  type StageNumbering,
  type TemperatureUnit,
  type Words,
} from '@broodsilk/shared';

/** The activity kinds partners hear about, and whether each is bad news (the keeper may add a message). */
export const PARTNER_UPDATE_KINDS: Readonly<Record<string, { badNews: boolean }>> = {
  'pairing.recorded': { badNews: false },
  'sac.laid': { badNews: false },
  'sac.pulled': { badNews: false },
  'sac.opened': { badNews: false },
  'brood.counted': { badNews: false },
  'sac.failed': { badNews: true },
  'project.ended': { badNews: true },
  'male.died': { badNews: false },
  'female.molted': { badNews: false },
  'account.hand-over': { badNews: false },
  'terms.proposed': { badNews: false },
  'terms.in-force': { badNews: false },
};

export const isPartnerUpdateKind = (kind: string): boolean => Object.hasOwn(PARTNER_UPDATE_KINDS, kind);
export const isBadNews = (kind: string): boolean => PARTNER_UPDATE_KINDS[kind]?.badNews ?? false;

/** What a failed sac or an early end tells each partner: the counts, what the terms say, the keeper's words. */
export interface BadNewsFacts {
  opening: { viable: number; dark: number; spoiled: number } | null;
  latestCount: { alive: number; stage: string } | null;
  /** Whether the event is about a sac (then a missing count is said). */
  aboutSac: boolean;
  terms: { number: number; clause: FailureClause; lines: { name: string; weight: number }[] } | null;
  message: string | null;
}

/** Everything the words of one update need, read once for all its recipients. */
export interface UpdateFacts {
  kind: string;
  data: Record<string, unknown>;
  summary: string;
  projectTitle: string;
  actorName: string | null;
  ownerName: string;
  sac: { layDate: string } | null;
  animalLabel: string | null;
  badNews: BadNewsFacts | null;
}

export interface UpdateReader {
  t: Words;
  numbering: StageNumbering;
  unit: TemperatureUnit;
}

const str = (v: unknown): string => (typeof v === 'string' || typeof v === 'number' ? String(v) : '');
const num = (v: unknown): number => (typeof v === 'number' ? v : 0);

/** The first sentence: what happened, said again in the reader's language from the event's data. */
function whatHappened(r: UpdateReader, f: UpdateFacts): string {
  const { t } = r;
  const d = f.data;
  const layDate = f.sac?.layDate ?? str(d.layDate);
  const stage = (s: unknown) => (isBroodStage(s) ? broodStageLabel(t, s, r.numbering) : str(s));
  switch (f.kind) {
    case 'pairing.recorded':
      return activitySentence(t, { kind: f.kind, summary: f.summary, data: d }, r);
    case 'sac.laid':
      return t('partnerUpdate.sacLaid', { layDate });
    case 'sac.pulled':
      return t('partnerUpdate.sacPulled', { layDate, pulledOn: str(d.pulledOn) });
    case 'sac.opened':
      return t(d.estimated ? 'partnerUpdate.sacOpenedEstimated' : 'partnerUpdate.sacOpened', { layDate, viable: num(d.viable) });
    case 'brood.counted':
      return t(num(d.lost) > 0 ? 'partnerUpdate.broodCountedLost' : 'partnerUpdate.broodCounted', {
        layDate,
        alive: num(d.alive),
        lost: num(d.lost),
        stage: stage(d.stage),
      });
    case 'sac.failed':
      return t('partnerUpdate.sacFailed', { layDate, reason: typeof d.failureReason === 'string' ? t(`sacFailure.${d.failureReason}`) : '' });
    case 'project.ended':
      return t('partnerUpdate.projectEnded', { reason: typeof d.reason === 'string' ? t(`endedEarly.${d.reason}`) : '' });
    case 'male.died':
      return t('partnerUpdate.maleDied', { male: f.animalLabel ?? '', on: str(d.on) });
    case 'female.molted':
      return t('partnerUpdate.femaleMolted', { female: f.animalLabel ?? str(d.female), moltedOn: str(d.moltedOn), pairedOn: str(d.pairedOn) });
    case 'account.hand-over':
      return t('partnerUpdate.handOver', { count: num(d.count) });
    case 'terms.proposed':
      return t('partnerUpdate.termsProposed', { number: num(d.number) });
    case 'terms.in-force':
      return t('partnerUpdate.termsInForce', { number: num(d.number) });
    default:
      return f.summary;
  }
}

/** The facts that go with bad news, one paragraph each. */
function badNewsParagraphs(r: UpdateReader, b: BadNewsFacts, ownerName: string): string[] {
  const { t } = r;
  const out: string[] = [];
  const counts: string[] = [];
  if (b.opening) counts.push(t('partnerUpdate.countsOpening', b.opening));
  if (b.latestCount) {
    const stage = isBroodStage(b.latestCount.stage) ? broodStageLabel(t, b.latestCount.stage, r.numbering) : b.latestCount.stage;
    counts.push(t('partnerUpdate.countsLatest', { alive: b.latestCount.alive, stage }));
  }
  if (counts.length) out.push(counts.join(' '));
  else if (b.aboutSac) out.push(t('partnerUpdate.countsNone'));
  if (b.terms) {
    out.push(`${t('partnerUpdate.termsHeading', { number: b.terms.number })} ${label(t, 'failureClauseText', b.terms.clause)}`);
    for (const line of b.terms.lines) out.push(t(`partnerUpdate.clauseFor.${b.terms.clause}`, line));
  } else {
    out.push(t('statement.noTerms'));
  }
  if (b.message) out.push(`${t('partnerUpdate.messageFrom', { owner: ownerName })}\n“${b.message}”`);
  return out;
}

/** One update as a reader reads it: a title and paragraphs (kept apart by a blank line in the body). */
export function partnerUpdateWords(r: UpdateReader, f: UpdateFacts): { title: string; paragraphs: string[] } {
  const { t } = r;
  const title = t('partnerUpdate.title', { project: f.projectTitle, what: activityKindLabel(t, f.kind) });
  const paragraphs = [whatHappened(r, f)];
  if (f.badNews) paragraphs.push(...badNewsParagraphs(r, f.badNews, f.ownerName));
  paragraphs.push(f.actorName ? t('partnerUpdate.recordedBy', { actor: f.actorName }) : t('partnerUpdate.recordedBySystem'));
  return { title, paragraphs };
}
