// Stands in for vite-plugin-pwa's virtual module in unit tests; records what the app asked for.
export interface RegisterSWOptions {
  immediate?: boolean;
  onNeedRefresh?: () => void;
  onOfflineReady?: () => void;
  onRegisteredSW?: (url: string, registration: unknown) => void;
  onRegisterError?: (error: unknown) => void;
}

export const registrations: RegisterSWOptions[] = [];
export const updates: boolean[] = [];

export function registerSW(options: RegisterSWOptions = {}): (reloadPage?: boolean) => Promise<void> {
  registrations.push(options);
  return async (reloadPage?: boolean) => {
    updates.push(reloadPage ?? true);
  };
}
