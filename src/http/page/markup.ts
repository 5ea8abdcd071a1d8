// The page's markup: masthead, the caution about predicted forms, and the four tools (analyze, table, paradigms, coverage).

/** Fill patterns shared by the chart, the legend and the table cells' swatches (so no source is told by colour alone). */
const PATTERNS = `<svg class="defs" width="0" height="0" aria-hidden="true" focusable="false">
<defs>
<pattern id="pat-attested" width="8" height="8" patternUnits="userSpaceOnUse"><rect width="8" height="8" fill="#24406e"/></pattern>
<pattern id="pat-predicted" width="8" height="8" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
<rect width="8" height="8" fill="#f4dfbd"/><rect width="3.5" height="8" fill="#9a4d0f"/></pattern>
<pattern id="pat-guessed" width="7" height="7" patternUnits="userSpaceOnUse">
<rect width="7" height="7" fill="#e9edd5"/><circle cx="3.5" cy="3.5" r="1.8" fill="#4f5f1f"/></pattern>
<pattern id="pat-none" width="10" height="10" patternUnits="userSpaceOnUse">
<rect width="10" height="10" fill="#ffffff"/><path d="M2 2l6 6M8 2l-6 6" stroke="#6d6357" stroke-width="1.2"/></pattern>
</defs>
</svg>`

/** The `<body>` of the page. */
export const PAGE_BODY = `<body>
${PATTERNS}
<a class="skip" href="#main">Skip to the tools</a>
<header class="masthead">
  <div class="brand">
    <svg class="fold-mark" viewBox="0 0 40 40" aria-hidden="true" focusable="false">
      <path d="M4 4h22l10 10v22H4z" fill="#fffaf0" stroke="#1d2830" stroke-width="2"/>
      <path d="M26 4v10h10" fill="#e6d8bf" stroke="#1d2830" stroke-width="2"/>
      <path d="M10 20h16M10 26h12M10 32h18" stroke="#9a4d0f" stroke-width="2.4"/>
    </svg>
    <div>
      <h1>formfold</h1>
      <p class="tagline">Word forms, their analyses and the tables behind them — learned from a dictionary's own tables.</p>
    </div>
  </div>
  <p id="model-line" class="model-line" role="status">Reading the model…</p>
</header>
<aside class="caution" aria-labelledby="caution-title">
  <p><strong id="caution-title">Predicted forms are hypotheses.</strong>
  Forms marked <span class="tag tag-predicted"><span class="tag-mark" aria-hidden="true">◇</span> predicted</span> or
  <span class="tag tag-guessed"><span class="tag-mark" aria-hidden="true">?</span> guessed</span> come from learned paradigms, not from the
  dictionary. They are suggestions to review with someone who knows the language, not normative forms.
  Only <span class="tag tag-attested"><span class="tag-mark" aria-hidden="true">■</span> attested</span> forms are the dictionary's own.</p>
</aside>
<nav class="toc" aria-label="Tools on this page">
  <ol>
    <li><a href="#search">Analyze a form</a></li>
    <li><a href="#table">A lemma's table</a></li>
    <li><a href="#paradigms">Paradigms</a></li>
    <li><a href="#coverage">Coverage of a text</a></li>
  </ol>
</nav>
<main id="main">
<section id="search" class="sheet" aria-labelledby="search-h">
  <h2 id="search-h" tabindex="-1"><span class="step" aria-hidden="true">1</span> Analyze a form</h2>
  <p class="hint">Every (lemma, UPOS, FEATS) analysis the model allows for a word form, with where it comes from and its score.</p>
  <form id="search-form" class="controls">
    <label for="search-input">Word form</label>
    <input id="search-input" name="form" type="search" autocomplete="off" spellcheck="false" required maxlength="256">
    <button type="submit">Analyze</button>
  </form>
  <p id="search-examples" class="examples"></p>
  <p id="search-status" class="status" role="status"></p>
  <div id="search-results"></div>
</section>
<section id="table" class="sheet" aria-labelledby="table-h">
  <h2 id="table-h" tabindex="-1"><span class="step" aria-hidden="true">2</span> A lemma's table</h2>
  <p class="hint">The dictionary's table when it has one; otherwise the table of the best paradigm, with a confidence for each form.</p>
  <form id="table-form" class="controls">
    <label for="table-lemma">Lemma</label>
    <input id="table-lemma" name="lemma" autocomplete="off" spellcheck="false" required maxlength="256">
    <label for="table-upos">Part of speech</label>
    <select id="table-upos" name="upos"><option value="">as in the dictionary</option></select>
    <button type="submit">Show table</button>
  </form>
  <p id="table-status" class="status" role="status"></p>
  <div id="table-results"></div>
</section>
<section id="paradigms" class="sheet" aria-labelledby="paradigms-h">
  <h2 id="paradigms-h" tabindex="-1"><span class="step" aria-hidden="true">3</span> Paradigms</h2>
  <p class="hint">Abstract tables shared by many lemmas: a rule per cell builds the form from the stems <var>x1</var>, <var>x2</var>… of the lemma.</p>
  <form id="paradigms-form" class="controls">
    <label for="paradigms-upos">Part of speech</label>
    <select id="paradigms-upos" name="upos"><option value="">all</option></select>
    <button type="submit">List paradigms</button>
  </form>
  <p id="paradigms-status" class="status" role="status"></p>
  <div class="paradigm-panes">
    <div id="paradigms-list" class="pane-list"></div>
    <div id="paradigm-detail" class="pane-detail" aria-live="polite"></div>
  </div>
</section>
<section id="coverage" class="sheet" aria-labelledby="coverage-h">
  <h2 id="coverage-h" tabindex="-1"><span class="step" aria-hidden="true">4</span> Coverage of a text</h2>
  <p class="hint">Paste running text: each token is counted by its best source, and the constraint file a tagger trains from is ready to download.</p>
  <form id="coverage-form" class="controls controls-stacked">
    <label for="coverage-text">Text to measure (plain text or CoNLL-U)</label>
    <textarea id="coverage-text" name="text" rows="5" spellcheck="false" required></textarea>
    <div class="controls-row">
      <label for="coverage-level">Allowed tags</label>
      <select id="coverage-level" name="level">
        <option value="upos">UPOS</option>
        <option value="full">UPOS and FEATS</option>
      </select>
      <button type="submit">Measure coverage</button>
    </div>
  </form>
  <p id="coverage-status" class="status" role="status"></p>
  <div id="coverage-results"></div>
</section>
</main>
<footer class="colophon">
  <p>The JSON API behind this page is described in <a href="/openapi.json">/openapi.json</a>; <a href="/health">/health</a> reports the service.
  The demo language, Sulvašti, is invented.</p>
</footer>
</body>`
