export const campaignProgressKeys = {
  all: ['campaign-progress'] as const,
  list: () => [...campaignProgressKeys.all, 'list'] as const,
  detail: (id: number) => [...campaignProgressKeys.all, 'detail', id] as const,
  public: (code: string) => [...campaignProgressKeys.all, 'public', code] as const,
};
