// The page's styles for what the tools show: source tags, result tables, table cells by source, the coverage chart.

/** Styles of results: every source has a marker, a word and a border or fill pattern, besides its colour. */
export const PAGE_STYLES_PARTS = `
.form { font-family: var(--serif); font-style: italic; font-size: 1.05em; }
.feats { font-family: var(--mono); font-size: .8rem; }
.feat { white-space: nowrap; }
.upos { font-family: var(--mono); font-size: .85rem; font-weight: 600; letter-spacing: .03em; }
.inherent { font-family: var(--mono); font-size: .8rem; color: var(--ink-soft); }
.none { color: var(--ink-soft); }
var { font-family: var(--mono); font-style: normal; font-weight: 700; color: var(--attested); }

.tag { display: inline-flex; align-items: baseline; gap: .15em; white-space: nowrap; font-size: .78rem; font-weight: 600;
  line-height: 1.35; padding: 0 .4em; border-radius: 3px; background: #fff; }
.tag-mark { font-size: .9em; }
.tag-attested { color: var(--attested); border: 1.5px solid var(--attested); }
.tag-predicted { color: var(--predicted); border: 1.5px dashed var(--predicted); }
.tag-guessed { color: var(--guessed); border: 1.5px dotted var(--guessed); }
.tag-none { color: var(--none); border: 3px double var(--none); }
.conf { font-weight: 500; }

.grid { width: 100%; border-collapse: collapse; margin: .3rem 0 .6rem; font-size: .95rem; }
.grid caption { text-align: left; font-family: var(--serif); font-style: italic; color: var(--ink-soft); padding: 0 0 .3rem; }
.grid th, .grid td { text-align: left; vertical-align: top; padding: .32rem .5rem; border-bottom: 1px solid var(--rule); }
.grid thead th { font-size: .78rem; text-transform: uppercase; letter-spacing: .06em; color: var(--ink-soft);
  border-bottom: 2px solid var(--ink); }
.paradigm-grid thead th { text-transform: none; letter-spacing: 0; font-family: var(--mono); font-size: .8rem; color: var(--ink); }
.grid .num { text-align: right; font-variant-numeric: tabular-nums; }
.candidates th, .candidates td { padding-left: .35rem; padding-right: .35rem; }
.candidates tbody tr.row-predicted th { border-left: 4px dashed var(--predicted); }
.candidates tbody tr.row-attested th { border-left: 4px solid var(--attested); }
.candidates tbody tr.row-guessed th { border-left: 4px dotted var(--guessed); }

.score { display: inline-flex; align-items: center; gap: .4rem; font-variant-numeric: tabular-nums; }
.score-track { width: 2.5rem; height: .55rem; border: 1px solid var(--ink-soft); background: #fff; border-radius: 2px; overflow: hidden; }
.score-fill { display: block; height: 100%; background: var(--ink); }

.lemma-table { border-top: 1px solid var(--rule); padding-top: .4rem; margin-top: .4rem; }
.table-title { margin: .2rem 0; font-size: 1.3rem; }
.table-facts { margin: .2rem 0 .5rem; }
.review { margin: .3rem 0 .6rem; padding: .4rem .6rem; border-left: 4px dashed var(--predicted); background: #fdf4e4; }
.cell { min-width: 8rem; }
.cell-attested { background: #fff; box-shadow: inset 4px 0 0 var(--attested); }
.cell-predicted { background: repeating-linear-gradient(135deg, #fff8ec 0 7px, #f6e6c9 7px 10px);
  outline: 1.5px dashed var(--predicted); outline-offset: -3px; }
.cell-gap { color: var(--ink-soft); font-style: italic; background: repeating-linear-gradient(90deg, #f4f1ea 0 2px, #fff 2px 6px); }
.variant { display: flex; flex-wrap: wrap; align-items: baseline; gap: .15rem .4rem; }
.variant + .variant { margin-top: .2rem; }
.corner { font-family: var(--mono); font-size: .75rem; color: var(--ink-soft); }
.corpus { font-size: .75rem; color: var(--ink-soft); }
.corpus-seen { color: var(--attested); font-weight: 600; }
.alternatives { font-size: .9rem; color: var(--ink-soft); }

.paradigm-panes { display: grid; grid-template-columns: minmax(0, 5fr) minmax(0, 6fr); gap: 1.25rem; align-items: start; }
@media (max-width: 980px) { .paradigm-panes { grid-template-columns: minmax(0, 1fr); } }
.pane-list { max-height: 30rem; overflow: auto; border: 1px solid var(--rule); padding: 0 .5rem; }
.paradigm-index tr.chosen th, .paradigm-index tr.chosen td { background: var(--fold); }
.paradigm h3 { margin: .2rem 0; font-size: 1.3rem; }
.rule { font-family: var(--mono); font-size: .85rem; white-space: nowrap; }
.rule-lit { color: var(--predicted); font-weight: 600; }
.rule-plus { color: var(--ink-soft); padding: 0 .08em; }
.or { font-size: .8rem; color: var(--ink-soft); }

.chart { margin: .4rem 0 .8rem; }
.chart figcaption { font-family: var(--serif); font-style: italic; color: var(--ink-soft); margin-bottom: .3rem; }
.bar-row { display: grid; grid-template-columns: 4.5rem minmax(0, 1fr); align-items: center; gap: .6rem; margin: .35rem 0; }
.bar-label { font-weight: 600; }
.bar { width: 100%; height: 2.2rem; display: block; }
.bar-frame { stroke: var(--ink); stroke-width: 1.5; }
.seg { stroke: var(--ink); stroke-width: 1; }
.swatch { width: 1rem; height: 1rem; vertical-align: -.15rem; }
.legend { max-width: 40rem; }
.uncovered { font-size: .92rem; }
.download { display: flex; flex-wrap: wrap; align-items: center; gap: .4rem .8rem; }
.preview pre { font-family: var(--mono); font-size: .78rem; background: #fff; border: 1px solid var(--rule); padding: .6rem;
  overflow: auto; max-height: 16rem; }
`
