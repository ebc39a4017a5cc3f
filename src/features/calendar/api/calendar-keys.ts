// Under 'studio': reset with the rest of the current studio's data when the studio changes.
export const calendarKeys = {
  all: ['studio', 'calendar'] as const,
  spans: () => [...calendarKeys.all, 'span'] as const,
  span: (from: string, to: string) => [...calendarKeys.spans(), { from, to }] as const,
  flags: () => [...calendarKeys.all, 'flags'] as const,
};
