/**
 * Settings the console reads at build time. The network's name will come from the settings API
 * once it exists; until then the demo network's name is the default.
 */
export const appConfig = {
  productName: 'Tallyloom',
  networkName: import.meta.env.VITE_NETWORK_NAME ?? 'Emberfold Blanket Network',
  apiBaseUrl: import.meta.env.VITE_API_BASE_URL ?? '/api',
} as const;
