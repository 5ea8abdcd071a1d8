// The page script's shared helpers: DOM building, API calls (with `?model=` passed on), status lines, source tags.
// Plain browser JavaScript kept as a string (no build step); it avoids template literals so it can live in one.

/** Helpers every tool of the page uses. */
export const CLIENT_CORE = String.raw`
'use strict';
const MODEL = new URLSearchParams(location.search).get('model');
const SOURCE_TEXT = { attested: 'attested', predicted: 'predicted', guessed: 'guessed', none: 'no candidate' };
const SOURCE_MARK = { attested: '■', predicted: '◇', guessed: '?', none: '×' };
const SOURCES = ['attested', 'predicted', 'guessed', 'none'];

const SVG_TAGS = ['svg', 'rect', 'title', 'g', 'text', 'desc'];

function $(id) { return document.getElementById(id); }

/** h('a', { href: '#x', class: 'c', onclick: f }, 'text', child…): an element, children as nodes or text. */
function h(tag, attrs) {
  const el = SVG_TAGS.indexOf(tag) >= 0
    ? document.createElementNS('http://www.w3.org/2000/svg', tag)
    : document.createElement(tag);
  for (const k in attrs || {}) {
    const v = attrs[k];
    if (v === null || v === undefined || v === false) continue;
    if (k === 'class') el.setAttribute('class', v);
    else if (k.slice(0, 2) === 'on') el.addEventListener(k.slice(2), v);
    else el.setAttribute(k, v === true ? '' : String(v));
  }
  for (let i = 2; i < arguments.length; i++) add(el, arguments[i]);
  return el;
}
function add(el, child) {
  if (child === null || child === undefined || child === false) return;
  if (Array.isArray(child)) { child.forEach((c) => add(el, c)); return; }
  el.appendChild(typeof child === 'object' ? child : document.createTextNode(String(child)));
}

/** Replace an element's children (arrays flattened, null and false left out). */
function fill(el) {
  el.replaceChildren();
  for (let i = 1; i < arguments.length; i++) add(el, arguments[i]);
  return el;
}

function withModel(path) {
  if (!MODEL) return path;
  return path + (path.indexOf('?') < 0 ? '?' : '&') + 'model=' + encodeURIComponent(MODEL);
}

/** A JSON route's answer; an error answer throws with the service's own message. */
async function api(path, init) {
  const res = await fetch(withModel(path), init);
  const type = res.headers.get('content-type') || '';
  const body = type.indexOf('json') >= 0 ? await res.json() : await res.text();
  if (!res.ok) {
    const err = new Error(body && body.error ? body.error.message : 'the service answered ' + res.status);
    err.status = res.status;
    throw err;
  }
  return body;
}

function setStatus(id, text, kind) {
  const el = $(id);
  el.textContent = text || '';
  el.className = 'status' + (kind ? ' status-' + kind : '');
}

function fmtScore(x) { return (Math.round(x * 100) / 100).toFixed(2); }
function fmtPct(x) { return (Math.round(x * 1000) / 10).toFixed(1) + ' %'; }
function fmtInt(n) { return Number(n).toLocaleString('en'); }

/** A source as a marker and a word (never colour alone), with the confidence of what is not attested. */
function sourceTag(source, score) {
  const conf = source !== 'attested' && source !== 'none' && typeof score === 'number';
  return h('span', { class: 'tag tag-' + source },
    h('span', { class: 'tag-mark', 'aria-hidden': 'true' }, SOURCE_MARK[source] || ''),
    ' ' + (SOURCE_TEXT[source] || source),
    conf ? h('span', { class: 'conf' }, ' · confidence ' + fmtScore(score)) : null);
}

/** A score as a small bar and its value. */
function scoreBar(score) {
  const pct = Math.max(0, Math.min(1, score)) * 100;
  return h('span', { class: 'score' },
    h('span', { class: 'score-track', 'aria-hidden': 'true' }, h('span', { class: 'score-fill', style: 'width:' + pct.toFixed(0) + '%' })),
    h('span', { class: 'score-num' }, fmtScore(score)));
}

/** FEATS that wrap only after a bar, never inside a feature. */
function featsText(feats) {
  const parts = feats.split('|');
  return h('span', { class: 'feats' }, parts.map((p, i) => [h('span', { class: 'feat' }, p + (i < parts.length - 1 ? '|' : '')), h('wbr')]));
}

/** A paradigm rule (x1+an, ve+x1+tto) with its stem variables set apart. */
function ruleText(rule) {
  return h('span', { class: 'rule' }, rule.split('+').map((part, i) => [
    i > 0 ? h('span', { class: 'rule-plus', 'aria-hidden': 'true' }, '+') : null,
    /^x\d+$/.test(part) ? h('var', null, part) : h('span', { class: 'rule-lit' }, part),
  ]));
}

/** A button that reads as a link inside text and tables. */
function linkButton(text, label, onclick) {
  return h('button', { type: 'button', class: 'linkish', 'aria-label': label, onclick: onclick }, text);
}

/** Bring a tool into view and move keyboard focus to its heading. */
function showSection(id) {
  const heading = $(id + '-h');
  heading.scrollIntoView({ block: 'start' });
  heading.focus({ preventScroll: true });
}
`
