// Starts the page: reads what the server offers, builds the three views, switches between them.
import { get } from './api.js';
import { PlayView } from './play.js';
import { EditView } from './edit.js';
import { ReplayView } from './replay.js';

const tabs = document.querySelectorAll('#tabs [data-view]');
function showView(name) {
  tabs.forEach(t => t.setAttribute('aria-selected', String(t.dataset.view === name)));
  document.querySelectorAll('.view').forEach(v => { v.hidden = v.id !== 'view-' + name; });
}
tabs.forEach(t => t.onclick = () => showView(t.dataset.view));

const setup = await get('/api/setup');
const play = new PlayView(setup);
new EditView(setup, play, showView);
new ReplayView(showView);
document.body.dataset.ready = 'true';
