export const settingWords = {
  name: { label: 'Studio name', meaning: undefined, range: undefined },
  paletteLimit: {
    label: 'Palette limit',
    meaning: 'The most colour groups a product may use before preflight points it out.',
    range: 'From 1 to 64.',
  },
  readyWeeksBeforeLaunch: {
    label: 'Weeks before launch',
    meaning: 'How many weeks before a collection launches its products should be ready.',
    range: 'From 0 to 52.',
  },
} as const;

export const settingHint = (key: keyof typeof settingWords) => {
  const { meaning, range } = settingWords[key];
  return meaning && range ? `${meaning} ${range}` : undefined;
};
