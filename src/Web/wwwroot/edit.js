// The Edit view: type a position, or build it — Hackenbush edges between points or from the
// ground (recolour, delete), a Domineering board's size and holes, Forms terms. The notation
// updates as you build, can be copied for the command line, and is analysed after every change.
// Below the analysis, compose finds positions of the chosen game whose value is one you type.
import { Slot, post, isAbort, caret } from './api.js';
import { show, moveOf } from './board.js';
import { AnalysisPanel } from './analysis.js';

const $ = id => document.getElementById(id);
const esc = s => String(s ?? '').replace(/[&<>"]/g, c => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);
const letter = { blue: 'B', red: 'R', green: 'G' };

export class EditView {
  #board = new Slot();
  #compose = new Slot();
  #timer = 0;
  constructor(setup, play, showView) {
    this.setup = setup;
    this.analysis = new AnalysisPanel($('edit-analysis'));
    this.shape = null;       // what the builder edits: edges, grid or terms
    this.selected = null;    // a Hackenbush edge index
    $('edit-ruleset').innerHTML = setup.rulesets.map(r => `<option value="${r.name}">${r.name}</option>`).join('');
    $('edit-ruleset').onchange = () => this.load(this.example());
    $('edit-text').oninput = () => { clearTimeout(this.#timer); this.#timer = setTimeout(() => this.load($('edit-text').value), 350); };
    $('edit-copy').onclick = () => this.copy();
    $('edit-play').onclick = () => { play.start(this.ruleset(), $('edit-text').value.trim()); showView('play'); };
    $('edit-board').onclick = e => this.clickBoard(e);
    $('compose-form').onsubmit = e => { e.preventDefault(); this.compose(); };
    $('compose-stop').onclick = () => this.#compose.cancel();
    $('compose-results').onclick = e => {
      const use = e.target.closest('[data-use]');
      if (use) this.load(use.dataset.use);
    };
    this.load(this.example());
  }

  ruleset() { return $('edit-ruleset').value; }
  example() { return this.setup.rulesets.find(r => r.name === this.ruleset())?.example ?? ''; }

  /** Reads typed notation: the builder takes the position apart, then everything is redrawn. */
  async load(text) {
    $('edit-text').value = text;
    // The analysis shown is of the old position from now on, not only once the new one is drawn.
    this.analysis.stale();
    try {
      const d = await post('/api/describe', { ruleset: this.ruleset(), position: text });
      this.shape = d.edges ? { edges: d.edges.map(e => ({ colour: e.colour, from: e.from, to: e.to })) }
        : d.grid ? { grid: d.grid } : d.terms ? { terms: d.terms } : null;
      this.selected = null;
      this.tools();
      this.refresh(text);
    } catch (e) {
      this.fail(e);
    }
  }

  fail(e) {
    if (isAbort(e)) return;
    $('edit-error').textContent = e.message;
    const c = caret(e);
    $('edit-caret').hidden = !c;
    $('edit-caret').textContent = c ?? '';
  }

  /** Notation from what the builder holds. */
  notation() {
    const s = this.shape;
    if (s?.edges) return s.edges.length ? `[${s.edges.map(e => `${letter[e.colour]}${e.from}-${e.to}`).join(',')}]` : '0';
    if (s?.grid) {
      const { rows, columns, filled } = s.grid;
      const holes = new Set(filled);
      return Array.from({ length: rows }, (_, r) => Array.from({ length: columns }, (_, c) =>
        holes.has(String.fromCharCode(97 + c) + (r + 1)) ? '#' : '.').join('')).join('/');
    }
    if (s?.terms) return s.terms.filter(t => t.trim()).join(' + ') || '0';
    return $('edit-text').value;
  }

  /** After a change made with the builder: new notation, picture and analysis. */
  changed() {
    const text = this.notation();
    $('edit-text').value = text;
    this.tools();
    this.refresh(text);
  }

  async refresh(text) {
    const game = { ruleset: this.ruleset(), start: text, first: 'left', moves: [] };
    this.analysis.stale();
    try {
      const b = await this.#board.post('/api/board', game);
      $('edit-error').textContent = '';
      $('edit-caret').hidden = true;
      show($('edit-board'), b);
      if (this.selected !== null) $('edit-board').querySelectorAll(`[data-move="e${this.selected + 1}"]`).forEach(x => x.classList.add('chosen'));
      this.analysis.run(game);
    } catch (e) {
      this.fail(e);
    }
  }

  clickBoard(event) {
    const s = this.shape;
    if (s?.edges) {
      const move = moveOf(event.target);
      if (!move) return;
      this.selected = Number(move.slice(1)) - 1;
      this.tools();
      $('edit-board').querySelectorAll('.chosen').forEach(x => x.classList.remove('chosen'));
      $('edit-board').querySelectorAll(`[data-move="${move}"]`).forEach(x => x.classList.add('chosen'));
      const c = this.analysis.componentOf(move);
      $('edit-help').textContent = c ? `Edge ${move} is in component ${c.index} (${c.exact ? c.value : 'no exact value'}); its thermograph is one click away in the table.` : '';
      return;
    }
    if (s?.grid) {
      const cell = event.target.closest('[data-cell]');
      if (!cell) return;
      const name = cell.dataset.cell;
      const filled = new Set(s.grid.filled);
      if (filled.has(name)) filled.delete(name); else filled.add(name);
      s.grid.filled = [...filled];
      this.changed();
    }
  }

  tools() {
    const box = $('edit-tools');
    const s = this.shape;
    if (s?.edges) {
      const points = [...new Set(s.edges.flatMap(e => [e.from, e.to]).filter(n => n !== 0))].sort((a, b) => a - b);
      const next = points.length ? Math.max(...points) + 1 : 1;
      const options = [`<option value="0">the ground</option>`, ...points.map(p => `<option value="${p}">point ${p}</option>`)];
      const sel = this.selected !== null ? s.edges[this.selected] : null;
      box.innerHTML = `
        <fieldset><legend>colour</legend>${['blue', 'red', 'green'].map((c, i) =>
          `<label><input type="radio" name="edit-colour" value="${c}" ${i === 0 ? 'checked' : ''}> ${c}</label>`).join('')}</fieldset>
        <label>from <select id="edit-from">${options.join('')}</select></label>
        <label>to <select id="edit-to"><option value="${next}">a new point (${next})</option>${options.join('')}</select></label>
        <button type="button" id="edit-add" class="primary">Add edge</button>
        ${sel ? `<span>edge e${this.selected + 1} (${sel.colour}):</span>
          ${['blue', 'red', 'green'].filter(c => c !== sel.colour).map(c => `<button type="button" data-recolour="${c}">make it ${c}</button>`).join('')}
          <button type="button" id="edit-delete">delete it</button>` : '<span class="help">click an edge to recolour or delete it</span>'}
        <button type="button" id="edit-clear">clear all</button>`;
      $('edit-add').onclick = () => {
        const colour = box.querySelector('input[name=edit-colour]:checked').value;
        s.edges.push({ colour, from: Number($('edit-from').value), to: Number($('edit-to').value) });
        this.selected = null;
        this.changed();
      };
      box.querySelectorAll('[data-recolour]').forEach(b => b.onclick = () => { sel.colour = b.dataset.recolour; this.changed(); });
      if (sel) $('edit-delete').onclick = () => { this.remove(this.selected); };
      $('edit-clear').onclick = () => { s.edges = []; this.selected = null; this.changed(); };
      $('edit-help').textContent = 'Build edges from the ground up: pick a colour and two ends (0 is the ground), then Add edge.';
    } else if (s?.grid) {
      box.innerHTML = `<label>rows <input id="edit-rows" type="number" min="1" max="12" value="${s.grid.rows}"></label>
        <label>columns <input id="edit-cols" type="number" min="1" max="12" value="${s.grid.columns}"></label>
        <button type="button" id="edit-clear">no holes</button>`;
      const resize = () => {
        const rows = Math.max(1, Math.min(12, Number($('edit-rows').value) || 1));
        const columns = Math.max(1, Math.min(12, Number($('edit-cols').value) || 1));
        s.grid = { rows, columns, filled: s.grid.filled.filter(n => n.charCodeAt(0) - 97 < columns && Number(n.slice(1)) <= rows) };
        this.changed();
      };
      $('edit-rows').onchange = resize;
      $('edit-cols').onchange = resize;
      $('edit-clear').onclick = () => { s.grid.filled = []; this.changed(); };
      $('edit-help').textContent = 'Click a cell to make it a hole (filled) or empty again.';
    } else if (s?.terms) {
      box.innerHTML = `<div class="terms">${s.terms.map((t, i) => `<div><input data-term="${i}" value="${esc(t)}" aria-label="term ${i + 1}">
        <button type="button" data-drop="${i}">remove</button></div>`).join('')}
        <div><button type="button" id="edit-term">add a term</button></div></div>`;
      box.querySelectorAll('[data-term]').forEach(inp => inp.onchange = () => { s.terms[Number(inp.dataset.term)] = inp.value; this.changed(); });
      box.querySelectorAll('[data-drop]').forEach(b => b.onclick = () => { s.terms.splice(Number(b.dataset.drop), 1); this.changed(); });
      $('edit-term').onclick = () => { s.terms.push('{1|-1}'); this.changed(); };
      $('edit-help').textContent = 'Each term is a game in value notation, e.g. {2|-1}, *, ↑, 3/4.';
    } else {
      box.innerHTML = '';
      $('edit-help').textContent = 'Type the position in its notation.';
    }
  }

  /** Deletes an edge, and the edges that no longer reach the ground through it (they would fall). */
  remove(index) {
    const s = this.shape;
    s.edges.splice(index, 1);
    const reached = new Set([0]);
    for (let grew = true; grew;) {
      grew = false;
      for (const e of s.edges)
        if (reached.has(e.from) !== reached.has(e.to)) { reached.add(e.from); reached.add(e.to); grew = true; }
    }
    const before = s.edges.length;
    s.edges = s.edges.filter(e => reached.has(e.from));
    this.selected = null;
    this.changed();
    $('edit-help').textContent = before > s.edges.length ? `Also removed ${before - s.edges.length} edge(s) that no longer touched the ground.` : '';
  }

  /** Asks the server for positions of the chosen game whose value is the one typed; each can be loaded into the editor. */
  async compose() {
    const value = $('compose-value').value.trim();
    $('compose-error').textContent = '';
    $('compose-caret').hidden = true;
    $('compose-results').innerHTML = '';
    $('compose-notes').innerHTML = '';
    $('compose-searched').textContent = '';
    if (!value) { $('compose-error').textContent = 'Type a value first, e.g. ↑ or {1|-1}.'; return; }
    const budget = 5000;
    $('compose-status').textContent = `Searching ${this.ruleset()} positions of value ${value} (up to ${budget / 1000} s)…`;
    $('compose-stop').hidden = false;
    try {
      const r = await this.#compose.post('/api/compose',
        { ruleset: this.ruleset(), value, count: Number($('compose-count').value), budget_ms: budget });
      const found = r.positions.length;
      $('compose-status').textContent = found
        ? `${found} position${found === 1 ? '' : 's'} of value ${r.target}, smallest first:`
        : `Found ${r.none}.`;
      $('compose-searched').textContent = `Searched ${r.searched}. Stopped: ${r.stopped}.`;
      $('compose-results').innerHTML = r.positions.map(p => `<li><code>${esc(p.text)}</code>
        <span class="help">${p.size} ${esc(r.size_unit)}, by ${p.route}</span>
        <button type="button" data-use="${esc(p.text)}">Edit this</button></li>`).join('');
      $('compose-notes').innerHTML = r.notes.map(n => `<li>${esc(n)}</li>`).join('');
    } catch (e) {
      if (isAbort(e)) { $('compose-status').textContent = 'Stopped.'; return; }
      $('compose-status').textContent = '';
      $('compose-error').textContent = e.message;
      const c = caret(e);
      $('compose-caret').hidden = !c;
      $('compose-caret').textContent = c ?? '';
    } finally {
      $('compose-stop').hidden = true;
    }
  }

  async copy() {
    const text = $('edit-text').value;
    try { await navigator.clipboard.writeText(text); $('edit-help').textContent = 'Notation copied.'; }
    catch { $('edit-text').select(); $('edit-help').textContent = 'Select-all done: copy with Ctrl+C.'; }
  }
}
