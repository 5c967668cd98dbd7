// Query keys of search, general to specific.
export const searchKeys = {
  all: ['search'] as const,
  results: (apiQuery: string) => [...searchKeys.all, 'results', apiQuery] as const,
  suggest: (q: string) => [...searchKeys.all, 'suggest', q] as const,
};
