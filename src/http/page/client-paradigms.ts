// The page's third tool: the paradigm book (GET /v1/paradigms, /v1/paradigms/:id) with an example lemma per paradigm.

/** List paradigms and show one with its rules and an example lemma's forms. */
// biome-ignore lint/complexity/noUselessStringRaw: kept raw like every client part, so a later escape stays JavaScript source
export const CLIENT_PARADIGMS = String.raw`
async function loadParadigms() {
  const upos = $('paradigms-upos').value;
  setStatus('paradigms-status', 'Reading the paradigm book…', 'busy');
  try {
    const answer = await api('/v1/paradigms' + (upos ? '?upos=' + encodeURIComponent(upos) : ''));
    renderParadigmList(answer.paradigms, upos);
  } catch (err) {
    setStatus('paradigms-status', 'Could not read the paradigms: ' + err.message, 'error');
  }
}

function renderParadigmList(list, upos) {
  const members = list.reduce((n, p) => n + p.members, 0);
  setStatus('paradigms-status', list.length + ' paradigms' + (upos ? ' of ' + upos : '') + ', followed by ' + fmtInt(members) +
    ' dictionary tables. Choose one to see its rules.');
  fill($('paradigms-list'), h('table', { class: 'grid paradigm-index' },
    h('caption', null, 'Paradigms' + (upos ? ' of ' + upos : '') + ', most members first'),
    h('thead', null, h('tr', null, ['Paradigm', 'Lemma shape', 'Cells', 'Members', 'Examples'].map((t) => h('th', { scope: 'col' }, t)))),
    h('tbody', null, list.map((p) => h('tr', { 'data-id': p.id },
      h('th', { scope: 'row' }, linkButton(p.id, 'Show the rules of ' + p.id, () => openParadigm(p.id, false))),
      h('td', null, ruleText(p.lemma)),
      h('td', { class: 'num' }, p.cells),
      h('td', { class: 'num' }, p.members),
      h('td', null, p.examples.map((e, i) => [i ? ', ' : '',
        linkButton(e, 'Open the table of ' + e + ', ' + p.upos, () => openTable(e, p.upos))])))))));
}

async function openParadigm(id, scroll) {
  if (scroll) showSection('paradigms');
  const detail = $('paradigm-detail');
  fill(detail, h('p', { class: 'status status-busy' }, 'Reading ' + id + '…'));
  document.querySelectorAll('#paradigms-list tr[data-id]').forEach((tr) => {
    tr.classList.toggle('chosen', tr.getAttribute('data-id') === id);
  });
  try {
    const p = await api('/v1/paradigms/' + encodeURIComponent(id));
    const example = p.examples[0];
    let table = null;
    if (example) table = await api('/v1/lemmas/' + encodeURIComponent(example) + '?upos=' + encodeURIComponent(p.upos)).then((a) => a.tables[0], () => null);
    renderParadigm(p, example, table);
  } catch (err) {
    fill(detail, h('p', { class: 'status status-error' }, 'Could not read ' + id + ': ' + err.message));
  }
}

function renderParadigm(p, example, table) {
  const formsOf = new Map();
  if (table) for (const f of table.forms) formsOf.set(f.cell, (formsOf.get(f.cell) || []).concat([f.form]));
  fill($('paradigm-detail'), h('article', { class: 'paradigm' },
    h('h3', null, p.id, ' ', h('span', { class: 'upos' }, p.upos)),
    h('p', { class: 'table-facts' }, 'Lemma shape ', ruleText(p.lemma), p.openPrefix ? ' (x1 may be empty: compounds fit too)' : '',
      '. ' + p.members + (p.members === 1 ? ' dictionary table follows it' : ' dictionary tables follow it') + '; example lemma ',
      example ? linkButton(example, 'Open the table of ' + example, () => openTable(example, p.upos)) : '—', '.'),
    h('table', { class: 'grid rules' },
      h('caption', null, 'Rules of ' + p.id + (example ? ', applied to ' + example : '')),
      h('thead', null, h('tr', null, h('th', { scope: 'col' }, 'Cell'), h('th', { scope: 'col' }, 'Rule'),
        h('th', { scope: 'col' }, example ? 'Form of ' + example : 'Example'))),
      h('tbody', null, p.cells.map((c) => h('tr', null,
        h('th', { scope: 'row' }, featsText(c.feats)),
        h('td', null, c.rule.map((r, i) => [i ? h('span', { class: 'or' }, ' or ') : null, ruleText(r)])),
        h('td', null, h('span', { class: 'form' }, (formsOf.get(c.feats) || ['—']).join(', ')))))))));
}

$('paradigms-form').addEventListener('submit', (ev) => {
  ev.preventDefault();
  loadParadigms();
});
`
