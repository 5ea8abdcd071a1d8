// Laying out a table's cells: as a two-way grid when one feature splits the cells evenly (Number in case ×
// number), else as a list of cells. Also the content of one cell: its forms, source, confidence, corpus evidence.

/** Cell layout and cell content. */
export const CLIENT_TABLE_GRID = String.raw`
function parseKey(key) {
  const out = {};
  if (key && key !== '_') key.split('|').forEach((p) => { const i = p.indexOf('='); out[p.slice(0, i)] = p.slice(i + 1); });
  return out;
}
function unique(xs) { return xs.filter((x, i) => xs.indexOf(x) === i); }
function keyWithout(parsed, name) {
  const rest = Object.keys(parsed).filter((k) => k !== name).map((k) => k + '=' + parsed[k]);
  return rest.length ? rest.join('|') : '_';
}

/**
 * The forms of a table grouped by cell, in the table's order except that the citation cell (the one whose
 * form is the lemma) comes first, so its row and column lead the grid (Nom and Sing, or the infinitive).
 */
function cellsOf(table) {
  const cells = [];
  const byKey = new Map();
  for (const f of table.forms) {
    let cell = byKey.get(f.cell);
    if (!cell) { cell = { key: f.cell, forms: [] }; byKey.set(f.cell, cell); cells.push(cell); }
    cell.forms.push(f);
  }
  const citation = cells.findIndex((c) => c.forms.some((f) => f.form === table.lemma));
  if (citation > 0) cells.unshift(cells.splice(citation, 1)[0]);
  return cells;
}

/** A column feature present in every cell with 2 or 3 values, when the grid it makes is at least half full. */
function pivotOf(cells) {
  const parsed = cells.map((c) => parseKey(c.key));
  if (parsed.length < 4) return null;
  let best = null;
  for (const name of Object.keys(parsed[0])) {
    if (!parsed.every((p) => name in p)) continue;
    const values = unique(parsed.map((p) => p[name]));
    if (values.length < 2 || values.length > 3) continue;
    if (!best || values.length < best.values.length) best = { name: name, values: values };
  }
  if (!best) return null;
  const rows = unique(parsed.map((p) => keyWithout(p, best.name)));
  if (cells.length < rows.length * best.values.length * 0.5) return null;
  const at = new Map(cells.map((c, i) => [keyWithout(parsed[i], best.name) + '\u0001' + parsed[i][best.name], c]));
  return { name: best.name, values: best.values, rows: rows, at: (row, value) => at.get(row + '\u0001' + value) };
}

/**
 * What the corpus says of a form, when the service reports it (a form's optional "corpus": a token count,
 * or true/false); nothing is shown while no corpus evidence is given.
 */
function corpusNote(f) {
  if (f.corpus === undefined || f.corpus === null) return null;
  const n = typeof f.corpus === 'number' ? f.corpus : (f.corpus ? 1 : 0);
  return h('span', { class: 'corpus ' + (n > 0 ? 'corpus-seen' : 'corpus-unseen') },
    h('span', { 'aria-hidden': 'true' }, n > 0 ? '✓ ' : '– '),
    n > 0 ? (typeof f.corpus === 'number' ? 'seen ' + fmtInt(n) + '× in the corpus' : 'seen in the corpus') : 'not in the corpus');
}

/** The content of one cell: each variant form with its source marker, text and confidence. */
function cellContent(cell) {
  return cell.forms.map((f) => h('span', { class: 'variant' },
    h('span', { class: 'form' }, f.form), ' ', sourceTag(f.source, f.score), corpusNote(f)));
}
function cellClass(cell) {
  return 'cell cell-' + (cell.forms.some((f) => f.source === 'predicted') ? 'predicted' : 'attested');
}

function gridTable(cells, caption) {
  const pivot = pivotOf(cells);
  if (pivot) {
    return h('table', { class: 'grid paradigm-grid' }, h('caption', null, caption),
      h('thead', null, h('tr', null, h('td', { class: 'corner' }, pivot.name),
        pivot.values.map((v) => h('th', { scope: 'col' }, pivot.name + '=' + v)))),
      h('tbody', null, pivot.rows.map((row) => h('tr', null,
        h('th', { scope: 'row' }, featsText(row)),
        pivot.values.map((v) => {
          const cell = pivot.at(row, v);
          return cell ? h('td', { class: cellClass(cell) }, cellContent(cell)) : h('td', { class: 'cell cell-gap' }, 'no form');
        })))));
  }
  return h('table', { class: 'grid paradigm-list' }, h('caption', null, caption),
    h('thead', null, h('tr', null, h('th', { scope: 'col' }, 'Cell'), h('th', { scope: 'col' }, 'Form'))),
    h('tbody', null, cells.map((cell) => h('tr', null,
      h('th', { scope: 'row' }, featsText(cell.key)),
      h('td', { class: cellClass(cell) }, cellContent(cell))))));
}
`
