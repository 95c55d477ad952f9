import { render } from 'preact';
import { App } from './ui/App.tsx';
import { startUpdateService } from './ui/update/pwaUpdate.ts';
import './ui/styles.css';

const updates = import.meta.env.PROD ? startUpdateService() : undefined;
render(<App updates={updates} />, document.getElementById('app')!);
