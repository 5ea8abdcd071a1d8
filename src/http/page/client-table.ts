// The page's second tool: a lemma's table (GET /v1/lemmas/:lemma), attested or predicted, cell by cell.

/** Show the tables of a lemma. */
// biome-ignore lint/complexity/noUselessStringRaw: kept raw like every client part, so a later escape stays JavaScript source
export const CLIENT_TABLE = String.raw`
async function openTable(lemma, upos) {
  $('table-lemma').value = lemma;
  $('table-upos').value = upos || '';
  showSection('table');
  await loadTable();
}

async function loadTable() {
  const lemma = $('table-lemma').value.trim().normalize('NFC');
  const upos = $('table-upos').value;
  if (!lemma) return;
  $('table-results').replaceChildren();
  setStatus('table-status', 'Building the table of “' + lemma + '”…', 'busy');
  try {
    const answer = await api('/v1/lemmas/' + encodeURIComponent(lemma) + (upos ? '?upos=' + encodeURIComponent(upos) : ''));
    const n = answer.tables.length;
    setStatus('table-status', n === 1 ? 'One table for “' + lemma + '”.' : n + ' tables for “' + lemma + '” (one per part of speech).');
    fill($('table-results'), answer.tables.map(renderTable));
  } catch (err) {
    setStatus('table-status', 'No table for “' + lemma + '”: ' + err.message, err.status === 404 ? 'empty' : 'error');
  }
}

function renderTable(t) {
  const cells = cellsOf(t);
  const predicted = t.forms.filter((f) => f.source === 'predicted').length;
  const attested = t.forms.length - predicted;
  const low = t.forms.filter((f) => f.source === 'predicted' && f.score < 0.5).length;
  const title = h('h3', { class: 'table-title' }, h('span', { class: 'form' }, t.lemma), ' ', h('span', { class: 'upos' }, t.upos),
    t.inherent && t.inherent !== '_' ? [' ', h('span', { class: 'inherent' }, t.inherent)] : null);
  const facts = h('p', { class: 'table-facts' },
    sourceTag(t.source, null),
    t.source === 'predicted'
      ? [' table: the most probable of the learned paradigms, ',
          t.paradigm ? linkButton(t.paradigm, 'Open paradigm ' + t.paradigm, () => openParadigm(t.paradigm, true)) : '—',
          ', table probability ' + fmtScore(t.score) + '.']
      : [' table: the dictionary lists it', t.paradigm ? [' (it follows paradigm ',
          linkButton(t.paradigm, 'Open paradigm ' + t.paradigm, () => openParadigm(t.paradigm, true)), ')'] : '', '.'],
    ' ' + cells.length + ' cells, ' + attested + ' attested and ' + predicted + ' predicted forms.');
  const review = t.source === 'predicted'
    ? h('p', { class: 'review' }, h('strong', null, 'To review: '),
        'every form of this table is a hypothesis' + (low ? '; ' + low + (low === 1 ? ' has' : ' have') + ' a confidence below 0.50' : '') +
        '. Cells are hatched and labelled “predicted” with their confidence.')
    : null;
  const caption = 'Table of ' + t.lemma + ' (' + t.upos + '), ' + (t.source === 'predicted' ? 'predicted' : 'attested');
  return h('article', { class: 'lemma-table is-' + t.source }, title, facts, review, gridTable(cells, caption), alternativesOf(t));
}

function alternativesOf(t) {
  if (!t.alternatives || t.alternatives.length === 0) return null;
  return h('p', { class: 'alternatives' }, 'Next most probable: ',
    t.alternatives.map((a, i) => [i ? ', ' : '', linkButton(a.paradigm, 'Open paradigm ' + a.paradigm, () => openParadigm(a.paradigm, true)),
      ' (' + fmtScore(a.score) + ')']));
}

$('table-form').addEventListener('submit', (ev) => {
  ev.preventDefault();
  loadTable();
});
`
