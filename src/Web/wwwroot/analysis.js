// The analysis panel: value and outcome class of the whole and of each component, who wins with
// each side to move, and a component's thermograph on request. Bounded by a budget; the panel
// says so plainly when the exact answer did not come in time, and shows the estimate.
import { Slot, isAbort } from './api.js';

const side = s => s ? `<span class="side-${s}">${s === 'left' ? 'Left' : 'Right'}</span>` : '?';
const esc = s => String(s ?? '').replace(/[&<>"]/g, c => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]);
const short = s => s.length > 60 ? s.slice(0, 57) + '…' : s;

export class AnalysisPanel {
  #slot = new Slot();
  #thermo = new Slot();
  constructor(element, { budgetMs = 2000 } = {}) {
    this.element = element;
    this.budgetMs = budgetMs;
    this.last = null;
  }

  /** The board is about to change: stop any analysis running and stop claiming the one shown is done. */
  stale() {
    this.#slot.cancel();
    this.element.dataset.done = 'false';
  }

  async run(game) {
    this.element.dataset.done = 'false';
    this.element.innerHTML = '<h2>Analysis</h2><p class="help" data-field="wait">working… <button type="button" data-stop>Stop</button></p>';
    this.element.querySelector('[data-stop]').onclick = () => this.#slot.cancel();
    try {
      const a = await this.#slot.post('/api/analyse', { ...game, budget_ms: this.budgetMs });
      this.last = a;
      this.render(a, game);
      this.element.dataset.done = 'true';
      return a;
    } catch (e) {
      if (isAbort(e)) { this.element.innerHTML = '<h2>Analysis</h2><p class="help">stopped.</p>'; return null; }
      this.element.innerHTML = `<h2>Analysis</h2><p class="error">${esc(e.message)}</p>`;
      return null;
    }
  }

  render(a, game) {
    const rows = a.components.map(c => `<tr data-component="${c.index}">
      <td>${c.index}</td><td class="text" title="${esc(c.text)}">${esc(short(c.text))}</td>
      <td>${c.exact ? esc(c.value) : `<span class="inexact">${esc(c.estimate ?? 'not exact')}</span>`}</td>
      <td>${esc(c.outcome ?? '')}</td>
      <td><button type="button" data-thermo="${c.index}" aria-label="thermograph of component ${c.index}">show</button></td></tr>`).join('');
    const head = a.exact
      ? `<p>Value <span class="big" data-field="value">${esc(a.value)}</span> &nbsp; class <b data-field="outcome">${esc(a.outcome)}</b>: ${esc(a.outcome_words)}.</p>
         <p data-field="winners">If Left moves next, ${side(a.left_first_wins)} wins.<br>If Right moves next, ${side(a.right_first_wins)} wins.</p>`
      : `<p class="inexact" data-field="inexact"><b>Not exact</b> — ${esc(a.note)}.${a.estimate ? `<br>Estimate: ${esc(a.estimate)}` : ''}</p>`;
    this.element.innerHTML = `<h2>Analysis</h2>${head}
      <table><thead><tr><th>#</th><th>component</th><th>value</th><th>class</th><th>thermo&shy;graph</th></tr></thead><tbody>${rows ||
        '<tr><td colspan="5">no components: nobody can move</td></tr>'}</tbody></table>
      <p class="help">${a.components.length} component${a.components.length === 1 ? '' : 's'}, ${a.elapsed_ms} ms.
      Classes: L Left wins, R Right wins, N whoever moves next wins, P whoever moves next loses.</p>`;
    this.element.querySelectorAll('[data-thermo]').forEach(b =>
      b.onclick = () => this.thermograph(game.ruleset, a.components[Number(b.dataset.thermo) - 1].text));
  }

  /** The component holding a move (so a click on the board can open its thermograph). */
  componentOf(move) {
    return this.last?.components.find(c => c.moves.includes(move)) ?? null;
  }

  async thermograph(ruleset, text) {
    const dialog = document.getElementById('thermo-dialog');
    const body = document.getElementById('thermo-body');
    body.innerHTML = '<p>drawing…</p>';
    if (!dialog.open) dialog.showModal();
    try {
      const t = await this.#thermo.post('/api/thermograph', { ruleset, position: text });
      body.innerHTML = `${t.svg}<p>${t.exact ? '' : '<b>Estimated</b> (no exact value within the budget). '}Temperature ${esc(t.temperature)}, mean ${esc(t.mean)}.</p>`;
    } catch (e) {
      if (!isAbort(e)) body.innerHTML = `<p class="error">${esc(e.message)}</p>`;
    }
  }
}
