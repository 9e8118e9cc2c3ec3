import type { NotificationKind, SacResponse } from '@broodsilk/shared';

/** A reminder that is due for one person, before the once-a-day check. */
export interface Candidate {
  key: string;
  userId: string;
  email: string;
  kind: NotificationKind;
  title: string;
  body: string;
  subject: { type: 'sac' | 'animal'; id: string };
  projectId: string | null;
}

export interface Person {
  id: string;
  email: string;
}

/** What is due on one sac for one person on their `today` (rolls due or overdue, a window opening or closing). */
export function sacCandidates(person: Person, projectId: string, projectTitle: string, sac: SacResponse): Candidate[] {
  const base = { userId: person.id, email: person.email, subject: { type: 'sac' as const, id: sac.id }, projectId };
  const out: Candidate[] = [];
  const where = `${projectTitle} (sac laid ${sac.layDate}, day ${sac.dayNumber})`;
  if (sac.roll && (sac.roll.status === 'due' || sac.roll.status === 'overdue')) {
    const overdue = sac.roll.status === 'overdue';
    out.push({
      ...base,
      key: `roll:${sac.id}:${person.id}:${sac.today}`,
      kind: overdue ? 'roll-overdue' : 'roll-due',
      title: overdue ? `Roll overdue: ${projectTitle}` : `Roll due: ${projectTitle}`,
      body: `${where}: the next roll was due at ${sac.roll.due} (UTC).`,
    });
  }
  if (!sac.pulled && !sac.leftWithMother && sac.pullWindow.opensOn === sac.today) {
    out.push({
      ...base,
      key: `pull-opens:${sac.id}:${person.id}:${sac.today}`,
      kind: 'pull-window-opens',
      title: `Pull window opens today: ${projectTitle}`,
      body: `${where}: the pull window opens today and closes on ${sac.pullWindow.closesOn}.`,
    });
  }
  if (!sac.pulled && !sac.leftWithMother && sac.pullWindow.closesOn === sac.today) {
    out.push({
      ...base,
      key: `pull-closes:${sac.id}:${person.id}:${sac.today}`,
      kind: 'pull-window-closes',
      title: `Pull window closes today: ${projectTitle}`,
      body: `${where}: today is the last day of the pull window.`,
    });
  }
  return out;
}
