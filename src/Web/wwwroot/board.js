// Drawing a position (the SVG comes from the server's picture code) and turning clicks on it into
// move names. Shared by every ruleset: an element with data-move names its move; Domineering's
// cells (data-cell) are picked two at a time and become the domino's top or left cell; Amazons'
// three at a time (the amazon, where it goes, where its arrow lands).

export function show(container, board) {
  if (board.svg) {
    container.innerHTML = board.svg;
    // Small positions are drawn larger (bigger targets for fingers), never wider than the screen.
    const svg = container.querySelector('svg');
    const width = Number(svg?.getAttribute('width'));
    if (width) svg.style.width = `min(100%, ${Math.round(width * 1.6)}px)`;
  }
  else {
    container.innerHTML = '';
    const pre = document.createElement('pre');
    pre.textContent = board.text;
    container.append(pre);
  }
}

/** The move an element of the picture stands for: the nearest data-move around it. */
export function moveOf(element) {
  return element.closest('[data-move]')?.dataset.move ?? null;
}

const cellParts = name => ({ col: name.charCodeAt(0) - 97, row: parseInt(name.slice(1), 10) });
const cellName = (col, row) => String.fromCharCode(97 + col) + row;

/**
 * Listens for moves made by pointing. pick() says how the current ruleset picks moves: 'point'
 * (the clicked element names its move), 'domino' (two neighbouring cells) or 'three' (three
 * squares: from, to, arrow). onMove(text) is
 * called with a move name; onProblem(text) with a reason when two cells make no domino for the
 * side to move.
 */
export function listen(container, { side, pick, onMove, onProblem, onPick }) {
  let picked = null;
  const clear = () => { picked?.classList.remove('picked'); picked = null; };
  // Amazons: three squares in turn (the amazon, its landing square, the arrow's square).
  let chain = [];
  const clearChain = () => { chain.forEach(c => c.classList.remove('picked')); chain = []; };
  container.onclick = event => {
    if (pick() === 'three') {
      const cell = event.target.closest('[data-cell]');
      if (!cell) return;
      if (chain.length > 0 && chain[chain.length - 1] === cell && chain.length === 1) { clearChain(); return; }
      chain.push(cell);
      cell.classList.add('picked');
      onPick?.(cell.dataset.cell);
      if (chain.length === 3) {
        const [from, to, arrow] = chain.map(c => c.dataset.cell);
        clearChain();
        onMove(`${from}-${to}/${arrow}`);
      }
      return;
    }
    if (pick() !== 'domino') {
      const move = moveOf(event.target);
      if (move) onMove(move, event.target);
      return;
    }
    const cell = event.target.closest('[data-cell]');
    if (!cell) return;
    if (picked === cell) { clear(); return; }
    if (!picked) { picked = cell; cell.classList.add('picked'); onPick?.(cell.dataset.cell); return; }
    const a = cellParts(picked.dataset.cell), b = cellParts(cell.dataset.cell);
    const vertical = a.col === b.col && Math.abs(a.row - b.row) === 1;
    const horizontal = a.row === b.row && Math.abs(a.col - b.col) === 1;
    const mover = side();
    if (!vertical && !horizontal) { clear(); picked = cell; cell.classList.add('picked'); onPick?.(cell.dataset.cell); return; }
    clear();
    if (vertical && mover !== 'left') { onProblem('Right places horizontal dominoes: pick two cells side by side.'); return; }
    if (horizontal && mover !== 'right') { onProblem('Left places vertical dominoes: pick two cells one above the other.'); return; }
    onMove(vertical ? cellName(a.col, Math.min(a.row, b.row)) : cellName(Math.min(a.col, b.col), a.row));
  };
}

/** Marks the elements of the given moves (hint): edges and options by name, dominoes by both cells. */
export function mark(container, moves, cls = 'hinted') {
  container.querySelectorAll('.' + cls).forEach(e => e.classList.remove(cls));
  for (const move of moves) {
    container.querySelectorAll(`[data-move="${CSS.escape(move)}"]`).forEach(e => e.classList.add(cls));
  }
}
