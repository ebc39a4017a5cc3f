export const settingWords = {
  name: { label: 'Studio name', hint: undefined },
  paletteLimit: {
    label: 'Palette limit',
    hint: 'The most colour groups a product may use before preflight points it out. From 1 to 64.',
  },
  readyWeeksBeforeLaunch: {
    label: 'Weeks before launch',
    hint: 'How many weeks before a collection launches its products should be ready. From 0 to 52.',
  },
} as const;
