// The Replay view: a match journal's games, filtered by player, result and blunders; one game
// stepped through ply by ply with the board drawn, blunders marked in words, and the exact value
// at each ply where the analysis finished within its budget. A link whose fragment holds a game
// (#ply=N&journal=<journal line, percent-encoded>, as `bramble match report` writes them) opens
// that game at once, at that ply.
import { Slot, post, isAbort } from './api.js';
import { show } from './board.js';

const $ = id => document.getElementById(id);
const word = s => s === 'left' ? 'Left' : 'Right';
const esc = s => String(s ?? '').replace(/[&<>"]/g, c => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);
const forfeits = new Set(['timeout', 'crash', 'bad-move', 'bad-reply']);

export class ReplayView {
  #slot = new Slot();
  constructor(showView) {
    this.showView = showView;
    this.games = [];
    this.game = null;
    this.plies = [];
    this.at = 0;
    $('replay-file').onchange = () => this.open($('replay-file').files[0]);
    for (const id of ['replay-player', 'replay-result', 'replay-blunders']) $(id).onchange = () => this.list();
    $('replay-first').onclick = () => this.go(0);
    $('replay-prev').onclick = () => this.go(this.at - 1);
    $('replay-next').onclick = () => this.go(this.at + 1);
    $('replay-last').onclick = () => this.go(this.plies.length - 1);
    document.addEventListener('keydown', e => {
      if ($('view-replay').hidden || !this.plies.length || e.target.closest('input, select')) return;
      if (e.key === 'ArrowLeft') this.go(this.at - 1);
      if (e.key === 'ArrowRight') this.go(this.at + 1);
    });
    window.addEventListener('hashchange', () => this.fromLink());
    this.fromLink();
  }

  async open(file) {
    if (!file) return;
    await this.load(await file.text(), file.name);
  }

  // Reads journal text through the server (the same checks as a file) and lists its games; true when it could.
  async load(text, name) {
    $('replay-error').textContent = '';
    try {
      const j = await post('/api/journal', { text });
      this.games = j.games;
      $('replay-notice').textContent = `${j.games.length} game${j.games.length === 1 ? '' : 's'} in ${name}.${j.notice ? ' ' + j.notice : ''}`;
      const players = [...new Set(j.games.flatMap(g => [g.left, g.right]))].sort();
      $('replay-player').innerHTML = '<option value="">anyone</option>' + players.map(p => `<option>${esc(p)}</option>`).join('');
      this.list();
      return true;
    } catch (e) {
      $('replay-error').textContent = e.message;
      return false;
    }
  }

  // The game in the address's fragment, if any: shown in the Replay view at the ply the link names.
  async fromLink() {
    const params = new URLSearchParams(location.hash.slice(1));
    const line = params.get('journal');
    if (line === null) return;
    this.showView('replay');
    if (!await this.load(line, 'the link')) return;
    const game = this.games[0];
    if (!game) return;
    const ply = Number(params.get('ply') ?? 0);
    await this.pick(game, $('replay-games').querySelector(`[data-game="${game.game}"]`), Number.isInteger(ply) ? ply : 0);
  }

  list() {
    const player = $('replay-player').value, result = $('replay-result').value, blunders = $('replay-blunders').checked;
    const shown = this.games.filter(g => (!player || g.left === player || g.right === player)
      && (!result || (result === 'forfeit' ? forfeits.has(g.end) : g.winner === result))
      && (!blunders || g.blunders.length > 0));
    $('replay-games').innerHTML = shown.map(g => `<button type="button" data-game="${g.game}">
      game ${g.game}: ${esc(g.left)} (Left) v ${esc(g.right)} (Right) — ${word(g.winner)} won (${esc(g.winner_id)}, ${esc(g.end)}),
      ${g.moves.length} plies${g.blunders.length ? `, ${g.blunders.length} blunder${g.blunders.length === 1 ? '' : 's'}` : ''}</button>`).join('')
      || '<p class="help">no game matches</p>';
    $('replay-games').querySelectorAll('[data-game]').forEach(b => b.onclick = () => this.pick(this.games.find(g => String(g.game) === b.dataset.game), b));
  }

  async pick(game, button, ply = 0) {
    this.game = game;
    $('replay-games').querySelectorAll('.current').forEach(b => b.classList.remove('current'));
    button?.classList.add('current');
    $('replay-status').textContent = 'Working out every position…';
    try {
      const r = await this.#slot.post('/api/replay', { ruleset: game.ruleset, start: game.start, first: game.first, moves: game.moves, budget_ms: 5000 });
      this.plies = r.plies;
      const blunderAt = new Map(game.blunders.map(b => [b.ply, b.by]));
      $('replay-plies').innerHTML = r.plies.map(p => `<li data-ply="${p.ply}" class="${blunderAt.has(p.ply) ? 'blunder' : ''}"><button type="button">
        ${p.ply}. ${p.ply === 0 ? 'start' : `<span class="side-${p.side}">${word(p.side)}</span> ${esc(p.move)}`}
        ${p.value != null ? ` · value ${esc(p.value)}` : ' · value not known in time'}
        ${blunderAt.has(p.ply) ? ` <span class="mark">✗ blunder by ${esc(blunderAt.get(p.ply))}</span>` : ''}</button></li>`).join('');
      $('replay-plies').querySelectorAll('[data-ply]').forEach(li => li.querySelector('button').onclick = () => this.go(Number(li.dataset.ply)));
      $('replay-stepper').hidden = false;
      this.go(ply);
    } catch (e) {
      if (!isAbort(e)) $('replay-error').textContent = e.message;
    }
  }

  go(at) {
    if (!this.plies.length) return;
    this.at = Math.max(0, Math.min(this.plies.length - 1, at));
    const p = this.plies[this.at];
    const g = this.game;
    show($('replay-board'), { svg: p.svg, text: p.text });
    const blunder = g.blunders.find(b => b.ply === p.ply);
    $('replay-where').textContent = `ply ${p.ply} of ${this.plies.length - 1}`;
    $('replay-status').innerHTML = (p.ply === 0 ? 'Start position' : `${word(p.side)} (${esc(p.side === 'left' ? g.left : g.right)}) played ${esc(p.move)}`) +
      (blunder ? ` — <span class="blunder-note">✗ blunder: ${esc(blunder.by)} moved from a won position to a lost one</span>` : '') +
      `. ${word(p.to_move)} to move` + (p.value != null ? `; value ${esc(p.value)} (${esc(p.outcome)}), ${word(p.winner)} wins with best play.` : '; exact value not known within the budget.');
    $('replay-plies').querySelectorAll('li').forEach(li => li.classList.toggle('current', Number(li.dataset.ply) === this.at));
    $('replay-plies').querySelector('li.current')?.scrollIntoView({ block: 'nearest' });
  }
}
