// The page's fourth tool: a pasted text's coverage (POST /v1/constraints) as a patterned bar chart, and its
// constraint file to download.

/** Measure a text and chart its coverage by source. */
export const CLIENT_COVERAGE = String.raw`
let downloadUrl = null;

async function measureCoverage() {
  const text = $('coverage-text').value;
  if (!text.trim()) return;
  const level = $('coverage-level').value;
  $('coverage-results').replaceChildren();
  setStatus('coverage-status', 'Measuring…', 'busy');
  try {
    const answer = await api('/v1/constraints?level=' + level, {
      method: 'POST',
      headers: { 'content-type': 'text/plain; charset=utf-8', accept: 'application/json' },
      body: text,
    });
    renderCoverage(answer.report, answer.file);
  } catch (err) {
    setStatus('coverage-status', 'Could not measure the text: ' + err.message, 'error');
  }
}

/** One horizontal bar: a patterned segment per source, wide as its share. */
function coverageBar(label, figures) {
  const width = 600;
  let x = 0;
  const parts = SOURCES.map((s) => {
    const w = figures.shares[s] * width;
    const rect = h('rect', { x: x.toFixed(2), y: 0, width: w.toFixed(2), height: 34, fill: 'url(#pat-' + s + ')', class: 'seg seg-' + s },
      h('title', null, SOURCE_TEXT[s] + ': ' + fmtInt(figures.counts[s]) + ' (' + fmtPct(figures.shares[s]) + ')'));
    x += w;
    return rect;
  });
  const said = SOURCES.map((s) => SOURCE_TEXT[s] + ' ' + fmtPct(figures.shares[s])).join(', ');
  return h('div', { class: 'bar-row' },
    h('span', { class: 'bar-label' }, label),
    h('svg', { class: 'bar', viewBox: '0 0 ' + width + ' 34', preserveAspectRatio: 'none', role: 'img', 'aria-label': label + ': ' + said },
      parts, h('rect', { x: 0, y: 0, width: width, height: 34, fill: 'none', class: 'bar-frame' })));
}

function legend(report) {
  return h('table', { class: 'grid legend' },
    h('caption', null, 'Tokens and form types by their best source'),
    h('thead', null, h('tr', null, ['Source', 'Tokens', 'Share', 'Types', 'Share'].map((t) => h('th', { scope: 'col' }, t)))),
    h('tbody', null, SOURCES.map((s) => h('tr', null,
      h('th', { scope: 'row' },
        h('svg', { class: 'swatch', viewBox: '0 0 16 16', 'aria-hidden': 'true' },
          h('rect', { width: 16, height: 16, fill: 'url(#pat-' + s + ')', class: 'bar-frame' })),
        ' ', sourceTag(s, null)),
      h('td', { class: 'num' }, fmtInt(report.tokens.counts[s])),
      h('td', { class: 'num' }, fmtPct(report.tokens.shares[s])),
      h('td', { class: 'num' }, fmtInt(report.types.counts[s])),
      h('td', { class: 'num' }, fmtPct(report.types.shares[s]))))));
}

function renderCoverage(report, file) {
  const tokens = report.tokens;
  setStatus('coverage-status', fmtPct(tokens.coverage) + ' of ' + fmtInt(tokens.total) + ' tokens have at least one candidate; ' +
    'ambiguity ' + report.ambiguity.toFixed(2) + ' tags per covered token.');
  if (downloadUrl) URL.revokeObjectURL(downloadUrl);
  downloadUrl = URL.createObjectURL(new Blob([file], { type: 'text/tab-separated-values' }));
  const lines = file.split('\n');
  const uncovered = report.uncovered.slice(0, 12);
  fill($('coverage-results'),
    h('figure', { class: 'chart' },
      h('figcaption', null, 'Coverage by source (attested / predicted / guessed / none)'),
      coverageBar('Tokens', tokens),
      coverageBar('Types', report.types)),
    legend(report),
    uncovered.length
      ? h('p', { class: 'uncovered' }, h('strong', null, 'No candidate: '),
          uncovered.map((u, i) => [i ? ', ' : '', h('span', { class: 'form' }, u.form), ' ×' + u.count]))
      : null,
    h('p', { class: 'download' },
      h('a', { class: 'button-link', href: downloadUrl, download: 'constraints.tsv', id: 'coverage-download' },
        'Download the constraint file (constraints.tsv, ' + fmtInt(report.types.total) + ' form types)'),
      ' One row per form type: form, count, best source, allowed tags. Predicted and guessed tags in it are hypotheses too.'),
    h('details', { class: 'preview' }, h('summary', null, 'First lines of the constraint file'),
      h('pre', null, lines.slice(0, 16).join('\n'))));
}

$('coverage-form').addEventListener('submit', (ev) => {
  ev.preventDefault();
  measureCoverage();
});
`
