/** Entry point: mounts the app shell into the page. */
import { mount } from 'svelte';
import App from './app/App.svelte';
import './app/shell/theme.css';
import { loadReportWhenIdle } from './app/shell/report-print.ts';

const target = document.getElementById('app');
if (!target) throw new Error('The page has no #app element to mount the ledger into.');

const app = mount(App, { target });
// The printed report's code comes in right after the first paint, so a print from the browser's
// own menu finds it even before the projects have opened.
loadReportWhenIdle();

export default app;
