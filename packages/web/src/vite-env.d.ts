/// <reference types="vite/client" />

interface ImportMetaEnv {
  /** Shown in the top bar beside the product name. */
  readonly VITE_NETWORK_NAME?: string;
  /** Where the API lives; the same origin under /api unless set. */
  readonly VITE_API_BASE_URL?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}
