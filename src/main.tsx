import { render } from 'preact';
import { App } from './ui/App.tsx';
import { createBrowserServices } from './ui/services.ts';
import { startUpdateService } from './ui/update/pwaUpdate.ts';
import './ui/styles.css';

const updates = import.meta.env.PROD ? startUpdateService() : undefined;
render(<App services={createBrowserServices()} updates={updates} />, document.getElementById('app')!);
