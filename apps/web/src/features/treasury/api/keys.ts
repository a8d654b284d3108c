/** Query keys for the treasurer's desk. */
export const treasuryKeys = {
  all: ['treasury'] as const,
  roster: () => [...treasuryKeys.all, 'roster'] as const,
  summary: () => [...treasuryKeys.all, 'summary'] as const,
  plans: () => [...treasuryKeys.all, 'plans'] as const,
  payments: (status?: string) => [...treasuryKeys.all, 'payments', status ?? 'all'] as const,
  reminderPreview: (userIds: number[]) =>
    [
      ...treasuryKeys.all,
      'reminder-preview',
      [...userIds].sort((a, b) => a - b).join(','),
    ] as const,
  calendar: () => [...treasuryKeys.all, 'calendar'] as const,
  calendarPreview: (month: number, day: number) =>
    [...treasuryKeys.calendar(), 'preview', month, day] as const,
};
