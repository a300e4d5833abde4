/**
 * Placing a programme's days on the calendar.
 *
 * - Programme week K (counted across blocks, which follow one another) starts on
 *   start + 7(K − 1) days; the week runs seven days from there, whatever weekday the start is.
 * - A day tagged with a weekday falls on that weekday inside its week.
 * - Untagged days take weekdays from the list given at assignment, in order, counted afresh in
 *   each block. Without a list (or when it runs short) they take a default spread for the
 *   number of untagged days in the block: 1 → mon; 2 → mon, thu; 3 → mon, wed, fri;
 *   4 → mon, tue, thu, fri; 5 → mon–fri; 6 → mon–sat; 7 → every day (common practice, no source).
 * - `weeks` cuts the programme after that many weeks; dates past 9999 are not scheduled.
 *
 * @example
 * scheduleWeeks([{ weeks: 1, days: [{ weekday: "thu" }, { weekday: null }] }], "2027-01-04", ["tue"]).slots.map((s) => s.date);
 * // ["2027-01-07", "2027-01-05"]   (slots in programme order; sort by date for display)
 */
import type { Weekday } from "../notation/model";
import { fromDayNumber, isoWeekdayNumber, toDayNumber, WEEKDAY_ORDER } from "../dates/date";

export const DEFAULT_WEEKDAYS: Readonly<Record<number, readonly Weekday[]>> = {
  1: ["mon"],
  2: ["mon", "thu"],
  3: ["mon", "wed", "fri"],
  4: ["mon", "tue", "thu", "fri"],
  5: ["mon", "tue", "wed", "thu", "fri"],
  6: ["mon", "tue", "wed", "thu", "fri", "sat"],
  7: WEEKDAY_ORDER,
};

export interface ScheduleBlock {
  weeks: number;
  days: readonly { weekday: Weekday | null }[];
}

export interface Slot {
  blockIndex: number;
  dayIndex: number;
  weekOfBlock: number;
  weekInProgramme: number;
  date: string;
  weekday: Weekday;
}

export interface ScheduleNote {
  blockIndex: number;
  dayIndex: number | null;
  message: string;
}

const LAST_DAY = toDayNumber("9999-12-31");

/**
 * Weekday each day of a block falls on, with notes when the list runs short.
 * @example blockWeekdays([{ weekday: null }, { weekday: "sat" }], ["wed"]).weekdays; // ["wed", "sat"]
 */
export function blockWeekdays(days: readonly { weekday: Weekday | null }[], given: readonly Weekday[] | undefined): { weekdays: Weekday[]; short: number[] } {
  const untagged = days.filter((d) => d.weekday === null).length;
  const fallback = DEFAULT_WEEKDAYS[Math.min(7, untagged)] ?? [];
  const short: number[] = [];
  let n = 0;
  const weekdays = days.map((d, i) => {
    if (d.weekday !== null) return d.weekday;
    const pick = given && n < given.length ? given[n] : fallback[n % 7];
    if (given && given.length > 0 && n >= given.length) short.push(i);
    n++;
    return pick;
  });
  return { weekdays, short };
}

/**
 * Every (block, week, day) of a programme with its date, in programme order.
 * @example scheduleWeeks([{ weeks: 2, days: [{ weekday: "mon" }] }], "2027-01-06").slots[1].date; // "2027-01-18"
 */
export function scheduleWeeks(blocks: readonly ScheduleBlock[], start: string, days?: readonly Weekday[], weeks?: number): { slots: Slot[]; notes: ScheduleNote[] } {
  const slots: Slot[] = [];
  const notes: ScheduleNote[] = [];
  const startDay = isoWeekdayNumber(start);
  const startNumber = toDayNumber(start);
  const limit = weeks ?? Infinity;
  let programmeWeek = 0;
  blocks.forEach((block, blockIndex) => {
    const { weekdays, short } = blockWeekdays(block.days, days);
    for (const i of short) notes.push({ blockIndex, dayIndex: i, message: `only ${days!.length} weekday(s) given; day ${i + 1} falls on ${weekdays[i]}` });
    const untagged = block.days.filter((d) => d.weekday === null).length;
    if (untagged > 7 && !(days && days.length >= untagged)) notes.push({ blockIndex, dayIndex: null, message: `${untagged} untagged days in one week: some share a weekday` });
    for (let w = 1; w <= Math.max(0, block.weeks); w++) {
      programmeWeek++;
      if (programmeWeek > limit) return;
      const weekStart = startNumber + 7 * (programmeWeek - 1);
      if (weekStart + 6 > LAST_DAY) {
        notes.push({ blockIndex, dayIndex: null, message: "weeks after the year 9999 are not scheduled" });
        programmeWeek = Infinity;
        return;
      }
      block.days.forEach((_, dayIndex) => {
        const weekday = weekdays[dayIndex];
        const offset = (WEEKDAY_ORDER.indexOf(weekday) + 1 - startDay + 7) % 7;
        slots.push({ blockIndex, dayIndex, weekOfBlock: w, weekInProgramme: programmeWeek, date: fromDayNumber(weekStart + offset), weekday });
      });
    }
  });
  return { slots, notes };
}
