/** Entry point: mounts the app shell into the page. */
import { mount } from 'svelte';
import App from './app/App.svelte';
import './app/shell/theme.css';

const target = document.getElementById('app');
if (!target) throw new Error('The page has no #app element to mount the ledger into.');

export default mount(App, { target });
