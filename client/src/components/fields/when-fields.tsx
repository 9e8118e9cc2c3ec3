import { Group } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { useState } from 'react';
import { todayIn } from '@broodsilk/shared';
import { dayjs } from '@/lib/dates';
import { DateField } from './date-field';
import { checkDate, readDate } from './typed-date';

/** When something happened: today and now unless the user gives an earlier day and time. */
export function useWhen(timeZone: string) {
  const [now] = useState(() => new Date());
  const today = todayIn(timeZone, now);
  const [date, setDate] = useState(today);
  const [time, setTime] = useState(() => dayjs(now).tz(timeZone).format('HH:mm'));
  const dateError = checkDate(date, { required: 'On which day?', latest: today, latestMessage: 'This has happened, so it cannot be after today.' });
  const timeError = /^\d{2}:\d{2}$/.test(time) ? null : 'The time as HH:MM.';
  const instant = dateError || timeError ? null : dayjs.tz(`${readDate(date)}T${time}`, timeZone);
  const future = instant !== null && instant.valueOf() > now.getTime() + 60_000;
  return {
    date,
    time,
    setDate,
    setTime,
    /** The calendar day given, for window checks; null while it is refused. */
    day: dateError ? null : readDate(date),
    error: dateError ?? timeError ?? (future ? 'This has happened, so it cannot be later than now.' : null),
    dateError,
    timeError: timeError ?? (future ? 'This has happened, so it cannot be later than now.' : null),
    /** The instant to send (ISO 8601), or null while the fields are refused. */
    instant: instant && !future ? instant.toISOString() : null,
  };
}

export type When = ReturnType<typeof useWhen>;

/** The day and time fields for a `useWhen`. */
export function WhenFields({ when, dateLabel = 'On', timeLabel = 'At' }: { when: When; dateLabel?: string; timeLabel?: string }) {
  return (
    <Group grow align="flex-start">
      <DateField label={dateLabel} value={when.date} onChange={(e) => when.setDate(e.currentTarget.value)} error={when.dateError} />
      <TimeInput label={timeLabel} value={when.time} onChange={(e) => when.setTime(e.currentTarget.value)} error={when.timeError} />
    </Group>
  );
}
