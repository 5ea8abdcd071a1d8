// The page's base styles: a paper-and-ink look of our own (sheets with a folded corner), layout, controls, focus.

/** Base styles: colours, type, layout, controls. */
export const PAGE_STYLES = `
:root {
  --paper: #f3ecdf; --sheet: #fffcf5; --ink: #1d2830; --ink-soft: #4a5560; --rule: #cdbfa6; --fold: #e6d8bf;
  --attested: #24406e; --predicted: #9a4d0f; --guessed: #4f5f1f; --none: #5d5348; --focus: #1b62c4;
  --serif: "Iowan Old Style", "Palatino Linotype", Palatino, "Book Antiqua", Georgia, serif;
  --sans: system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", sans-serif;
  --mono: ui-monospace, "SFMono-Regular", Menlo, Consolas, "DejaVu Sans Mono", monospace;
}
* { box-sizing: border-box; }
html { background: var(--paper); color: var(--ink); font: 16px/1.5 var(--sans); }
body { margin: 0 auto; max-width: 1220px; padding: 0 1.25rem 2rem; }
.defs { position: absolute; width: 0; height: 0; overflow: hidden; }
h1, h2, h3 { font-family: var(--serif); font-weight: 600; line-height: 1.2; }
a { color: var(--attested); }
a:hover { color: var(--predicted); }
:focus-visible { outline: 3px solid var(--focus); outline-offset: 2px; }
h2:focus { outline: none; }
h2:focus-visible { outline: 3px solid var(--focus); }
.skip { position: absolute; left: -9999px; top: 0; background: var(--ink); color: var(--sheet); padding: .5rem 1rem; }
.skip:focus { left: 1rem; z-index: 2; }

.masthead { display: flex; flex-wrap: wrap; align-items: flex-end; justify-content: space-between; gap: .5rem 2rem;
  padding: 1.4rem 0 1rem; border-bottom: 3px double var(--ink); }
.brand { display: flex; gap: .9rem; align-items: center; }
.fold-mark { width: 3rem; height: 3rem; flex: none; }
.masthead h1 { margin: 0; font-size: 2.3rem; letter-spacing: .02em; }
.tagline { margin: .15rem 0 0; color: var(--ink-soft); font-family: var(--serif); font-style: italic; }
.model-line { margin: 0; font-size: .9rem; color: var(--ink-soft); max-width: 34rem; }

.caution { margin: 1rem 0; padding: .75rem 1rem .75rem 1.1rem; background: #fbe8c6; border: 2px dashed var(--predicted);
  border-left-width: .5rem; border-radius: 4px; }
.caution p { margin: 0; }
.caution strong { font-family: var(--serif); font-size: 1.05rem; }

.toc ol { display: flex; flex-wrap: wrap; gap: .35rem 1.4rem; margin: 0 0 1rem; padding: 0; list-style: none; counter-reset: toc; }
.toc li { counter-increment: toc; }
.toc li::before { content: counter(toc) "."; font-family: var(--serif); font-weight: 700; margin-right: .3rem; color: var(--predicted); }

main { display: grid; grid-template-columns: minmax(0, 1fr) minmax(0, 1fr); gap: 1.25rem; align-items: start; }
#paradigms, #coverage { grid-column: 1 / -1; }
@media (max-width: 980px) { main { grid-template-columns: minmax(0, 1fr); } }

.sheet { position: relative; background: var(--sheet); border: 1px solid var(--rule); border-radius: 2px;
  padding: 1rem 1.25rem 1.25rem; box-shadow: 0 1px 0 var(--rule), 0 6px 14px -10px rgba(29, 40, 48, .45); }
.sheet::before { content: ""; position: absolute; top: -1px; right: -1px; width: 2rem; height: 2rem;
  background: linear-gradient(225deg, var(--paper) 0 50%, var(--fold) 50% 100%); border-bottom-left-radius: 3px;
  box-shadow: -1px 1px 0 var(--rule); }
.sheet h2 { margin: .1rem 0 .35rem; font-size: 1.45rem; display: flex; align-items: center; gap: .6rem; }
.step { display: inline-grid; place-items: center; width: 1.9rem; height: 1.9rem; border: 2px solid var(--ink); border-radius: 50%;
  font-size: 1rem; font-family: var(--serif); background: var(--paper); }
.hint { margin: 0 0 .8rem; color: var(--ink-soft); }
#search-results, #table-results, .pane-detail, #coverage-results { overflow-x: auto; }

.controls { display: flex; flex-wrap: wrap; align-items: center; gap: .5rem .6rem; margin: 0 0 .6rem; }
.controls label { font-weight: 600; }
.controls-stacked { flex-direction: column; align-items: stretch; }
.controls-row { display: flex; flex-wrap: wrap; align-items: center; gap: .5rem .6rem; }
input, select, textarea { font: inherit; color: var(--ink); background: #fff; border: 1.5px solid var(--ink-soft); border-radius: 3px;
  padding: .35rem .5rem; }
input { min-width: 12rem; flex: 1 1 12rem; font-family: var(--serif); font-size: 1.05rem; }
textarea { width: 100%; font-family: var(--serif); font-size: 1.02rem; resize: vertical; }
button, .button-link { font: inherit; font-weight: 600; cursor: pointer; color: var(--sheet); background: var(--ink);
  border: 2px solid var(--ink); border-radius: 3px; padding: .35rem .9rem; text-decoration: none; display: inline-block; }
button:hover, .button-link:hover { background: var(--predicted); border-color: var(--predicted); color: #fff; }
button.linkish { color: var(--attested); background: none; border: none; padding: 0; font-weight: 600;
  text-decoration: underline; text-decoration-thickness: 1px; text-underline-offset: 2px; }
button.linkish:hover { color: var(--predicted); background: none; }

.status { min-height: 1.5em; margin: .3rem 0 .5rem; }
.status-busy { color: var(--ink-soft); font-style: italic; }
.status-error { color: #8d1c1c; font-weight: 600; }
.status-error::before { content: "Error — "; }
.status-empty { color: var(--ink-soft); }
.examples { margin: 0 0 .4rem; font-size: .92rem; color: var(--ink-soft); }

.colophon { margin-top: 1.6rem; padding-top: .6rem; border-top: 1px solid var(--rule); color: var(--ink-soft); font-size: .9rem; }
`
