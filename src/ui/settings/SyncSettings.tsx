import { useEffect, useState } from 'preact/hooks';
import type { Settings } from '../../store/index.ts';
import { normaliseServerUrl, syncTargetFrom } from '../../sync/index.ts';
import type { AppServices } from '../services.ts';
import './syncSettings.css';

interface SyncSettingsProps {
  settings: Settings;
  services: AppServices;
  onChange(settings: Settings): void;
}

/** The lab server's address and this phone's token, typed here or set by the server's link. */
export function SyncSettings({ settings, services, onChange }: SyncSettingsProps) {
  const [server, setServer] = useState(settings.syncServer);
  const [token, setToken] = useState(settings.syncToken);
  const [message, setMessage] = useState<{ text: string; isProblem: boolean } | null>(null);
  // Settings set from outside (the server's link) show up here too.
  useEffect(() => {
    setServer(settings.syncServer);
    setToken(settings.syncToken);
  }, [settings.syncServer, settings.syncToken]);
  const isChanged = server.trim() !== settings.syncServer || token.trim() !== settings.syncToken;

  const save = () => {
    try {
      const syncServer = server.trim() === '' ? '' : normaliseServerUrl(server.trim());
      onChange({ ...settings, syncServer, syncToken: token.trim() });
      setServer(syncServer);
      setMessage({ text: token.trim() ? 'Saved. Finished runs will be sent to the lab server.' : 'Saved. Sync is off without a token.', isProblem: false });
      void services.outbox.retryFailed().then(() => services.outbox.flush(true));
    } catch (error) {
      setMessage({ text: error instanceof Error ? error.message : String(error), isProblem: true });
    }
  };

  const check = async () => {
    setMessage({ text: 'Checking…', isProblem: false });
    try {
      const target = syncTargetFrom({ syncServer: server.trim(), syncToken: token.trim() }, location.origin);
      if (!target) throw new Error('Type the token first.');
      const response = await fetch(new URL('api/whoami', target.serverUrl), { headers: { authorization: `Bearer ${target.token}` } });
      const body = (await response.json().catch(() => null)) as { token?: { label?: string }; error?: string } | null;
      if (!response.ok) throw new Error(body?.error ?? `the server answered ${response.status}`);
      setMessage({ text: `Connected: the server knows this phone as “${body?.token?.label ?? '?'}”.`, isProblem: false });
    } catch (error) {
      setMessage({ text: `Not connected: ${error instanceof Error ? error.message : String(error)}`, isProblem: true });
    }
  };

  return (
    <div class="sync-settings">
      <h2>Lab server</h2>
      <p class="hint">Finished runs are sent to the lab’s server when there is a network. They also stay on this phone.</p>
      <label class="sync-field">
        <span>Server address</span>
        <input
          class="text-input"
          type="url"
          inputMode="url"
          autoComplete="off"
          placeholder={`${location.origin} (this app’s server)`}
          value={server}
          onInput={(e) => setServer(e.currentTarget.value)}
        />
      </label>
      <label class="sync-field">
        <span>Token for this phone</span>
        <input class="text-input" type="password" autoComplete="off" value={token} onInput={(e) => setToken(e.currentTarget.value)} />
      </label>
      <p class="hint">The lab makes a token with npm run server -- token create "hood 3 phone"; opening the link it prints fills both in.</p>
      <div class="action-row">
        <button type="button" class="action action-quiet" disabled={!isChanged} onClick={save}>Save</button>
        <button type="button" class="action action-quiet" onClick={() => void check()}>Check connection</button>
      </div>
      {message && <p class={message.isProblem ? 'warning' : 'notice'} role="status">{message.text}</p>}
    </div>
  );
}
