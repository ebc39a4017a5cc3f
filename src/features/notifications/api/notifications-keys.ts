export const notificationsKeys = {
  all: ['notifications'] as const,
  list: () => [...notificationsKeys.all, 'list'] as const,
  settings: () => [...notificationsKeys.all, 'settings'] as const,
};
