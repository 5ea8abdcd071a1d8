// The page script's start-up: name the model served, fill the part-of-speech lists, offer example lemmas.

/** Runs last, once every tool is defined. */
// biome-ignore lint/complexity/noUselessStringRaw: kept raw like every client part, so a later escape stays JavaScript source
export const CLIENT_START = String.raw`
async function start() {
  try {
    const models = (await api('/v1/models')).models;
    const m = models.find((x) => (MODEL ? x.name === MODEL : x.default)) || models[0];
    const s = m.summary;
    $('model-line').textContent = 'Model “' + m.name + '”' + (m.served ? ' (version ' + m.served + ')' : '') + ': ' +
      fmtInt(s.lemmas) + ' lemmas, ' + fmtInt(s.tables) + ' with a dictionary table, ' + fmtInt(s.bareLemmas) + ' without; ' +
      fmtInt(s.paradigms) + ' paradigms; ' + fmtInt(s.forms) + ' forms known.';
  } catch (err) {
    $('model-line').textContent = 'The model could not be read: ' + err.message;
  }
  try {
    const all = (await api('/v1/paradigms')).paradigms;
    const upos = unique(all.map((p) => p.upos)).sort();
    for (const id of ['table-upos', 'paradigms-upos']) {
      const sel = $(id);
      upos.forEach((u) => sel.appendChild(h('option', { value: u }, u)));
    }
    const main = ['NOUN', 'VERB', 'ADJ'].filter((u) => upos.indexOf(u) >= 0);
    if (main.length) $('paradigms-upos').value = main[0];
    const picks = (main.length ? main : upos).map((u) => all.find((p) => p.upos === u)).filter((p) => p && p.examples.length);
    if (picks.length) {
      fill($('search-examples'), 'Examples from this model: ', picks.map((p, i) => [i ? ', ' : '',
        linkButton(p.examples[0], 'Analyze ' + p.examples[0], () => runSearch(p.examples[0]))]), '.');
    }
    renderParadigmList(all.filter((p) => !main.length || p.upos === main[0]), main[0] || '');
  } catch (err) {
    setStatus('paradigms-status', 'Could not read the paradigms: ' + err.message, 'error');
  }
}
start();
`
