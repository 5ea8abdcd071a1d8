// The page's first tool: a form's candidate analyses (GET /v1/analyze), each linked to its table and paradigm.

/** Analyze a form and list its candidates. */
// biome-ignore lint/complexity/noUselessStringRaw: kept raw like every client part, so a later escape stays JavaScript source
export const CLIENT_SEARCH = String.raw`
async function runSearch(form) {
  form = form.trim();
  if (!form) return;
  $('search-input').value = form;
  $('search-results').replaceChildren();
  setStatus('search-status', 'Looking up “' + form + '”…', 'busy');
  try {
    const answer = await api('/v1/analyze?form=' + encodeURIComponent(form));
    renderCandidates(answer);
  } catch (err) {
    setStatus('search-status', 'Could not analyze “' + form + '”: ' + err.message, 'error');
  }
}

function renderCandidates(answer) {
  const list = answer.candidates;
  if (list.length === 0) {
    setStatus('search-status', 'No candidate for “' + answer.form + '”: the model neither knows nor can guess it.', 'empty');
    return;
  }
  const how = answer.normalized.filter((x) => x !== 'exact');
  const counts = SOURCES.filter((s) => s !== 'none')
    .map((s) => [s, list.filter((c) => c.source === s).length])
    .filter((x) => x[1] > 0)
    .map((x) => x[1] + ' ' + x[0]);
  setStatus('search-status', list.length + (list.length === 1 ? ' candidate' : ' candidates') + ' for “' + answer.form + '” (' +
    counts.join(', ') + ')' + (how.length ? '; found as ' + how.join(', ') : '') + '.');
  const rows = list.map((c) => h('tr', { class: 'row-' + c.source },
    h('th', { scope: 'row' }, linkButton(c.lemma, 'Open the table of ' + c.lemma + ', ' + c.upos, () => openTable(c.lemma, c.upos))),
    h('td', null, c.upos),
    h('td', null, featsText(c.feats)),
    h('td', null, sourceTag(c.source, null)),
    h('td', null, scoreBar(c.score)),
    h('td', null, c.paradigm
      ? linkButton(c.paradigm, 'Open paradigm ' + c.paradigm, () => openParadigm(c.paradigm, true))
      : h('span', { class: 'none' }, '—'))));
  fill($('search-results'), h('table', { class: 'grid candidates' },
    h('caption', null, 'Candidates for ', h('span', { class: 'form' }, answer.form), ', best first'),
    h('thead', null, h('tr', null,
      ['Lemma', 'UPOS', 'FEATS', 'Source', 'Score', 'Paradigm'].map((t) => h('th', { scope: 'col' }, t)))),
    h('tbody', null, rows)));
}

$('search-form').addEventListener('submit', (ev) => {
  ev.preventDefault();
  runSearch($('search-input').value);
});
`
