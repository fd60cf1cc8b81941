// The Play view: a game against a built-in strategy (or an engine named at start), moves by
// pointing, the computer's reply named, undo, new game, the move list and the result. The game
// lives in this tab only (sessionStorage), so each tab holds its own game.
import { Slot, post, isAbort, caret } from './api.js';
import { show, listen, mark } from './board.js';
import { AnalysisPanel } from './analysis.js';

const $ = id => document.getElementById(id);
const word = s => s === 'left' ? 'Left' : 'Right';
const esc = s => String(s ?? '').replace(/[&<>"]/g, c => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);

export class PlayView {
  #slot = new Slot();
  constructor(setup) {
    this.setup = setup;
    this.game = null;      // { ruleset, start, first, moves, human, opponent, level }
    this.board = null;     // the last board from the server
    this.analysis = new AnalysisPanel($('play-analysis'));
    const rulesets = setup.rulesets;
    $('play-ruleset').innerHTML = rulesets.map(r => `<option value="${r.name}">${r.name}</option>`).join('');
    $('play-opponent').innerHTML = [...setup.strategies, ...setup.engines].map(s => `<option value="${s.name}">${esc(s.words)}</option>`).join('');
    $('play-level').innerHTML = setup.levels.map(l => `<option value="${l.name}">${esc(l.words)}</option>`).join('');
    $('play-level').value = 'quick';
    $('play-ruleset').onchange = () => { $('play-start').value = this.ruleset().example; };
    $('play-setup').onsubmit = e => { e.preventDefault(); this.newGame(); };
    $('play-undo').onclick = () => this.undo();
    $('play-hint').onclick = () => this.hint();
    $('play-stop').onclick = () => this.#slot.cancel();
    listen($('play-board'), {
      side: () => this.board?.to_move,
      pick: () => this.ruleset(this.board?.ruleset).pick,
      onMove: move => this.move(move),
      onProblem: text => this.error(text),
      onPick: cell => this.error(''),
    });
    const saved = sessionStorage.getItem('bramble.play');
    if (saved) {
      try { this.restore(JSON.parse(saved)); return; } catch { sessionStorage.removeItem('bramble.play'); }
    }
    $('play-start').value = this.ruleset().example;
    this.newGame();
  }

  ruleset(name = $('play-ruleset').value) { return this.setup.rulesets.find(r => r.name === name) ?? this.setup.rulesets[0]; }
  computer() { return this.game.human === 'left' ? 'right' : 'left'; }
  error(text) { $('play-error').textContent = text; }
  request(extra = {}) {
    const g = this.game;
    return { ruleset: g.ruleset, start: g.start, first: g.first, moves: g.moves, opponent: g.opponent, computer: this.computer(), level: g.level, ...extra };
  }

  restore(game) {
    this.game = game;
    $('play-ruleset').value = game.ruleset;
    $('play-start').value = game.start;
    $('play-opponent').value = game.opponent;
    $('play-level').value = game.level;
    $('play-side').value = game.human;
    $('play-first').value = game.first === game.human ? 'you' : 'computer';
    this.send({});
  }

  newGame(start) {
    const human = $('play-side').value;
    const computer = human === 'left' ? 'right' : 'left';
    this.game = {
      ruleset: $('play-ruleset').value,
      start: start ?? $('play-start').value.trim(),
      first: $('play-first').value === 'you' ? human : computer,
      moves: [],
      human,
      opponent: $('play-opponent').value,
      level: $('play-level').value,
    };
    $('play-reply').textContent = '';
    this.send({}, true);
  }

  /** Plays a position given from elsewhere (the editor). */
  start(ruleset, text) {
    $('play-ruleset').value = ruleset;
    $('play-start').value = text;
    this.newGame(text);
  }

  move(move) {
    if (!this.board || this.board.over) return;
    if (this.board.to_move !== this.game.human) { this.error('Wait for the computer’s move.'); return; }
    this.send({ move });
  }

  async send(extra, fresh = false) {
    this.error('');
    this.analysis.stale();
    this.busy(true);
    const before = this.game.moves.length;
    try {
      const r = await this.#slot.post('/api/play', this.request(extra));
      this.game.moves = r.board.moves.map(m => m.move);
      sessionStorage.setItem('bramble.play', JSON.stringify(this.game));
      if (r.reply) {
        const by = r.reply.by.replace(/^engine:/, '');
        $('play-reply').innerHTML = `The computer (${word(r.reply.side)}, ${esc(by)}) played <b id="play-reply-move">${esc(r.reply.move)}</b>` +
          `${r.reply.note ? ` — ${esc(r.reply.note)}` : ''} <span class="help">(${r.reply.ms} ms)</span>`;
      } else if (fresh) $('play-reply').textContent = '';
      this.render(r.board);
    } catch (e) {
      if (isAbort(e)) { this.error('Stopped. Make a move, or press New game.'); this.game.moves.length = before; }
      else {
        const c = caret(e);
        this.error(c ? `${e.message}\n${c}` : e.message);
        if (fresh && !this.board) $('play-board').textContent = '';
      }
      this.busy(false);
      return;
    }
    this.busy(false);
    this.analysis.run(this.request());
  }

  busy(on) {
    $('play-board').classList.toggle('busy', on);
    $('play-board').dataset.busy = String(on);
    $('play-stop').hidden = !on;
    $('play-undo').disabled = on;
    $('play-hint').disabled = on;
    if (on) $('play-status').textContent = 'The computer is thinking…';
  }

  render(board) {
    this.board = board;
    const el = $('play-board');
    el.dataset.plies = String(board.moves.length);
    el.dataset.over = String(board.over);
    el.dataset.toMove = board.to_move;
    show($('play-board'), board);
    const r = this.ruleset(board.ruleset);
    const you = this.game.human;
    const colour = s => s === 'left' ? r.left_is : r.right_is;
    if (board.over) {
      const won = board.winner === you;
      $('play-status').innerHTML = `<span id="play-result">Game over: ${word(board.to_move)} has no move, so ${word(board.winner)} wins — ${won ? 'you win!' : 'the computer wins.'}</span>`;
    } else if (board.to_move === you) {
      $('play-status').textContent = `Your move: you are ${word(you)} (${colour(you)}).`;
    } else {
      $('play-status').textContent = `The computer's move (${word(board.to_move)}).`;
    }
    $('play-help').textContent = `${board.ruleset}: ${r.move_hint}. Position now: ${board.text}`;
    $('play-moves').innerHTML = board.moves.map(m =>
      `<li><span class="side-${m.side}">${word(m.side)}</span> ${esc(m.move)} ${m.side === you ? '(you)' : '(computer)'}</li>`).join('') ||
      '<li class="help">no moves yet</li>';
    $('play-legal').innerHTML = board.over || board.to_move !== you ? '<span class="help">not your turn</span>'
      : board.legal.map(m => `<button type="button" data-legal="${esc(m)}">${esc(m)}</button>`).join('');
    $('play-legal').querySelectorAll('[data-legal]').forEach(b => b.onclick = () => this.move(b.dataset.legal));
  }

  undo() {
    const g = this.game;
    if (!g || g.moves.length === 0) return;
    // Back to the last position where it was your turn: your move and the computer's reply go.
    const moverAt = i => (i % 2 === 0) === (g.first === 'left') ? 'left' : 'right';
    let n = g.moves.length - 1;
    while (n >= 0 && moverAt(n) !== g.human) n--;
    if (n < 0) return;
    g.moves = g.moves.slice(0, n);
    $('play-reply').textContent = 'Took back your last move.';
    this.send({});
  }

  async hint() {
    if (!this.board || this.board.over) return;
    $('play-reply').textContent = 'Looking for winning moves…';
    try {
      const h = await post('/api/hint', { ...this.request(), budget_ms: 3000 });
      mark($('play-board'), h.winning);
      $('play-reply').innerHTML = h.exact
        ? `<span id="play-hint-text" data-winning="${esc(h.winning.join(' '))}">Hint: ${h.winning.length ? `winning moves for ${word(h.side)}: <b>${esc(h.winning.join(', '))}</b> (glowing on the board)` : esc(h.note)}</span>`
        : `Hint: ${esc(h.note)}`;
    } catch (e) {
      if (!isAbort(e)) this.error(e.message);
    }
  }
}
