/** Query keys for reports, general to specific. */
export const reportKeys = {
  all: ['reports'] as const,
  production: (month: string) => [...reportKeys.all, 'production', month] as const,
  history: (recipeId: number) => [...reportKeys.all, 'history', recipeId] as const,
};
