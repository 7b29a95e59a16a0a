import { createEvent } from 'ics';

// The .ics file for a dye-along (RFC 5545), made with the `ics` package: one event in UTC, so
// every calendar shows it on its owner's clock, with a display alarm an hour before.

export interface CalendarEventInput {
  dyeAlongId: string;
  title: string;
  studioName: string;
  startsAt: Date;
  expectedLengthMin: number;
  pageUrl: string;
  streamUrl: string | null;
  /** Bumped when the event changes, so calendars replace the old copy. */
  sequence: number;
  /** Host of the public origin, for a stable UID. */
  originHost: string;
}

/** Calendar apps use the UID to update an event they already hold instead of adding another. */
export const calendarUid = (dyeAlongId: string, originHost: string) =>
  `dye-along-${dyeAlongId}@${originHost}`;

export function dyeAlongCalendar(input: CalendarEventInput): string {
  const { value, error } = createEvent({
    productId: 'vatside/dye-along',
    method: 'PUBLISH',
    uid: calendarUid(input.dyeAlongId, input.originHost),
    sequence: input.sequence,
    start: input.startsAt.getTime(),
    startInputType: 'utc',
    startOutputType: 'utc',
    duration: { minutes: input.expectedLengthMin },
    title: `${input.title} (${input.studioName} dye-along)`,
    description: [
      `Live dye-along with ${input.studioName}.`,
      `Supplies, prep checklist and safety notes: ${input.pageUrl}`,
      ...(input.streamUrl ? [`Stream: ${input.streamUrl}`] : []),
    ].join('\n'),
    url: input.pageUrl,
    location: input.streamUrl ?? input.pageUrl,
    status: 'CONFIRMED',
    busyStatus: 'BUSY',
    alarms: [
      {
        action: 'display',
        description: `${input.title} starts in one hour: soak the yarn and set out your supplies.`,
        trigger: { hours: 1, before: true },
      },
    ],
  });
  if (error || !value) throw error ?? new Error('The calendar file could not be made.');
  return value;
}
