// The demo's days. Stories say "n days ago at 09:40" in the agency's local time (a fixed six hours
// behind UTC, our choice for the invented state); the clock turns that into an instant before the
// seed ran, so desks show believable waits and a few requests are overdue.
import type { StoryCalendar, When } from './storyTypes';

const agencyOffsetHours = -6;
const dayMs = 24 * 3600 * 1000;

export type DemoClock = StoryCalendar & { instant(when: When): Date; now: Date };

export function demoClock(now: Date = new Date()): DemoClock {
  // Midnight of the seed's day in agency time, as an instant.
  const local = new Date(now.getTime() + agencyOffsetHours * 3600 * 1000);
  const todayLocalMidnight = Date.UTC(local.getUTCFullYear(), local.getUTCMonth(), local.getUTCDate()) - agencyOffsetHours * 3600 * 1000;
  return {
    now,
    instant({ daysAgo, at }) {
      const match = /^(\d{2}):(\d{2})$/.exec(at);
      if (!match) throw new Error(`demo time "${at}" is not HH:MM`);
      const instant = new Date(todayLocalMidnight - daysAgo * dayMs + (Number(match[1]) * 60 + Number(match[2])) * 60 * 1000);
      // Stories tell the past only; a move "later today" would sit in the future of the trail.
      if (instant.getTime() > now.getTime()) throw new Error(`demo time ${daysAgo} days ago at ${at} is after the seed's own time`);
      return instant;
    },
    date(daysFromToday) {
      return new Date(todayLocalMidnight + daysFromToday * dayMs - agencyOffsetHours * 3600 * 1000).toISOString().slice(0, 10);
    },
  };
}
