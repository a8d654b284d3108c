import type { z } from 'zod';
import type { DuesCalendarDto, duesCalendarSchema, JoinPreviewDto } from '@app/shared';
import { MembershipPlan, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { getSetting, setSetting } from '../club/club.service';
import { addDays, fiscalYearOf, quoteFor, toIsoDate, type DuesCalendar } from '../dues/calendar';

type CalendarInput = z.output<typeof duesCalendarSchema>;

/** What a member joining on `today` would pay on each active plan under `cal` (the plan's proration rule). */
async function joinPreview(cal: DuesCalendar, today: string): Promise<JoinPreviewDto[]> {
  const plans = await MembershipPlan.findAll({
    where: { active: true },
    order: [['amountMinor', 'DESC']],
  });
  return plans.flatMap((p) => {
    const q = quoteFor({ paidThrough: null, joinedOn: today }, p, today, cal);
    if (!q) return [];
    return [
      {
        planId: p.id,
        planName: p.name,
        proration: p.proration,
        currency: p.currency,
        fullMinor: p.amountMinor,
        joinMinor: q.duesMinor,
        coversFrom: q.coversFrom,
        coversTo: q.coversTo,
      },
    ];
  });
}

/**
 * The saved dues calendar, or `proposal` laid over it, with the fiscal year holding today, the next one, and what
 * joining today would cost on each active plan. Nothing is saved.
 */
export async function calendarView(
  proposal: Partial<CalendarInput> = {},
  now = new Date(),
): Promise<DuesCalendarDto> {
  const calendar = { ...(await getSetting('duesCalendar')), ...proposal };
  const today = toIsoDate(now);
  const fiscalYear = fiscalYearOf(today, calendar);
  return {
    calendar,
    today,
    fiscalYear,
    nextFiscalYear: fiscalYearOf(addDays(fiscalYear.end, 1), calendar),
    joinToday: await joinPreview(calendar, today),
  };
}

/**
 * Saves the dues calendar and audits the change (before and after). Paid-through dates are left as they are: the
 * next quote for each member runs to the end of the fiscal year under the new calendar.
 */
export async function updateCalendar(actor: User, input: CalendarInput, now = new Date()) {
  const before = await getSetting('duesCalendar');
  await setSetting('duesCalendar', input);
  await recordAudit({
    actorId: actor.id,
    area: 'treasury',
    action: 'calendar.update',
    subjectType: 'club_setting',
    subjectId: 'duesCalendar',
    details: { before, after: input },
  });
  return calendarView({}, now);
}
