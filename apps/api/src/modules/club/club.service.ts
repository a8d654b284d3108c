import type { Transaction } from 'sequelize';
import { z } from 'zod';
import {
  DEFAULT_CLUB_LOCALE,
  DEFAULT_STORM_CHECKLIST,
  clubLocaleSchema,
  stormChecklistSchema,
} from '@app/shared';
import { ClubSetting, Harbor } from '../../models';

/** Every club setting, with its schema and default. Stored as JSON in club_settings. */
export const SETTINGS = {
  clubName: z.string().min(2).max(100).default('Your club'),
  listingRequiresPaidUp: z.boolean().default(true),
  substantialEditRatio: z.number().min(0).max(1).default(0.2),
  membersOnlyPostsAllowed: z.boolean().default(true),
  duesCalendar: z
    .object({
      fiscalYearStartMonth: z.number().int().min(1).max(12),
      fiscalYearStartDay: z.number().int().min(1).max(28).default(1),
      renewalWindowDays: z.number().int().min(0).max(120),
      lapseAfterDays: z.number().int().min(1).max(730),
    })
    .default({
      fiscalYearStartMonth: 4,
      fiscalYearStartDay: 1,
      renewalWindowDays: 30,
      lapseAfterDays: 90,
    }),
  /** The storm-watch checklist template; each new watch copies it. */
  stormChecklist: stormChecklistSchema.default({ items: DEFAULT_STORM_CHECKLIST }),
  /** How dates, numbers and money read, the currency new prices start in, and new members' units. */
  locale: clubLocaleSchema.default(DEFAULT_CLUB_LOCALE),
} as const;
export type SettingKey = keyof typeof SETTINGS;
export type SettingValue<K extends SettingKey> = z.infer<(typeof SETTINGS)[K]>;

/** Reads one setting, falling back to its default when unset or invalid. */
export async function getSetting<K extends SettingKey>(
  key: K,
  transaction?: Transaction,
): Promise<SettingValue<K>> {
  const row = await ClubSetting.findByPk(key, { transaction });
  const parsed = SETTINGS[key].safeParse(row?.value);
  return (parsed.success ? parsed.data : SETTINGS[key].parse(undefined)) as SettingValue<K>;
}

export async function setSetting<K extends SettingKey>(key: K, value: SettingValue<K>) {
  await ClubSetting.upsert({ key, value: SETTINGS[key].parse(value) });
}

export const listHarbors = () => Harbor.findAll({ order: [['name', 'ASC']] });
