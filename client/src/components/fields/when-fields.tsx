import { Group } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { useState } from 'react';
import { todayIn } from '@broodsilk/shared';
import { dayjs } from '@/lib/dates';
import { DateField } from './date-field';
import { checkDate, readDate } from './typed-date';
import { useWords } from '@/lib/i18n';

/** When something happened: today and now unless the user gives an earlier day and time. */
export function useWhen(timeZone: string) {
  const t = useWords();
  const [now] = useState(() => new Date());
  const today = todayIn(timeZone, now);
  const [date, setDate] = useState(today);
  const [time, setTime] = useState(() => dayjs(now).tz(timeZone).format('HH:mm'));
  const dateError = checkDate(date, { required: t('page.shell.fields.whichDay'), latest: today, latestMessage: t('page.shell.fields.notAfterToday') });
  const timeError = /^\d{2}:\d{2}$/.test(time) ? null : t('page.shell.fields.timeAsHhMm');
  const instant = dateError || timeError ? null : dayjs.tz(`${readDate(date)}T${time}`, timeZone);
  const future = instant !== null && instant.valueOf() > now.getTime() + 60_000;
  return {
    date,
    time,
    setDate,
    setTime,
    /** The calendar day given, for window checks; null while it is refused. */
    day: dateError ? null : readDate(date),
    error: dateError ?? timeError ?? (future ? t('page.shell.fields.notLaterThanNow') : null),
    dateError,
    timeError: timeError ?? (future ? t('page.shell.fields.notLaterThanNow') : null),
    /** The instant to send (ISO 8601), or null while the fields are refused. */
    instant: instant && !future ? instant.toISOString() : null,
  };
}

export type When = ReturnType<typeof useWhen>;

/** The day and time fields for a `useWhen`. */
export function WhenFields({ when, dateLabel, timeLabel }: { when: When; dateLabel?: string; timeLabel?: string }) {
  const t = useWords();
  return (
    <Group grow align="flex-start">
      <DateField
        label={dateLabel ?? t('page.shell.fields.on')}
        value={when.date}
        onChange={(e) => when.setDate(e.currentTarget.value)}
        error={when.dateError}
      />
      <TimeInput
        label={timeLabel ?? t('page.shell.fields.at')}
        value={when.time}
        onChange={(e) => when.setTime(e.currentTarget.value)}
        error={when.timeError}
      />
    </Group>
  );
}
