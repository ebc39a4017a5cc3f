export const healthKeys = { all: ['health'] as const };
