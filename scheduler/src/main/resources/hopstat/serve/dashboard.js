// The hopstat service dashboard: polls the JSON API and draws the queue, progress and a live
// figure (mean ± standard error of a quantity against a grid parameter) as plain DOM and SVG.
'use strict';

const POLL_MS = 1000;
const COLOURS = ['#3a7bd5', '#d35400', '#2e9d58', '#8e44ad', '#c0392b', '#16a085', '#7f8c8d', '#f39c12'];
const SVG_NS = 'http://www.w3.org/2000/svg';
let selected = null;
let chosenQuantity = null;
let chosenAxis = null;

function el(tag, attrs, text) {
  const e = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs || {})) e.setAttribute(k, v);
  if (text !== undefined) e.textContent = text;
  return e;
}

function svg(tag, attrs, text) {
  const e = document.createElementNS(SVG_NS, tag);
  for (const [k, v] of Object.entries(attrs || {})) e.setAttribute(k, v);
  if (text !== undefined) e.textContent = text;
  return e;
}

function duration(seconds) {
  if (seconds === null || seconds === undefined) return '–';
  if (seconds < 120) return seconds.toFixed(0) + ' s';
  if (seconds < 7200) return (seconds / 60).toFixed(1) + ' min';
  return (seconds / 3600).toFixed(1) + ' h';
}

function num(v, digits) {
  if (v === null || v === undefined) return '–';
  return Number(v).toPrecision(digits || 4);
}

async function api(path, options) {
  const response = await fetch(path, Object.assign({ credentials: 'same-origin', cache: 'no-store' }, options || {}));
  const body = await response.json();
  if (!response.ok) throw new Error(body.message || body.error || response.statusText);
  return body;
}

async function act(id, action) {
  try {
    await api('/api/jobs/' + id + '/' + action, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: '{}' });
  } catch (e) {
    alert(action + ' ' + id + ': ' + e.message);
  }
  poll();
}

function progressBar(p, state) {
  const wrap = el('span', { class: 'state-' + state });
  const bar = el('span', { class: 'bar', title: p.finished + ' of ' + p.planned });
  const fill = el('span', { class: 'fill' });
  fill.style.display = 'block';
  fill.style.width = (100 * (p.fraction || 0)).toFixed(1) + '%';
  bar.appendChild(fill);
  wrap.appendChild(bar);
  wrap.appendChild(document.createTextNode(' ' + p.finished + ' / ' + (p.adaptive ? '≤ ' : '') + p.planned));
  return wrap;
}

function renderQueue(jobs) {
  const body = document.querySelector('#queue tbody');
  body.replaceChildren();
  document.getElementById('empty').style.display = jobs.length ? 'none' : 'block';
  for (const entry of jobs) {
    const job = entry.job;
    const p = entry.progress;
    const tr = el('tr', { 'data-job': job.id, 'data-state': job.state });
    if (job.id === selected) tr.className = 'selected';
    tr.appendChild(el('td', {}, job.id));
    tr.appendChild(el('td', { class: 'state' }, job.state + (entry.stopping ? ' (stopping)' : '')));
    tr.appendChild(el('td', {}, String(job.priority)));
    const prog = el('td', { class: 'progress' });
    prog.appendChild(progressBar(p, job.state));
    tr.appendChild(prog);
    tr.appendChild(el('td', { class: 'eta' }, job.state === 'RUNNING' ? duration(p.etaSeconds) : '–'));
    tr.appendChild(el('td', { class: p.failed ? 'warn' : '' }, String(p.failed)));
    tr.appendChild(el('td', { class: p.nonQuantised ? 'warn' : '' }, String(p.nonQuantised)));
    const actions = el('td');
    const buttons = { QUEUED: ['pause', 'cancel'], RUNNING: ['pause', 'cancel'], PAUSED: ['resume', 'cancel'] }[job.state] || [];
    for (const a of buttons) {
      const b = el('button', { type: 'button', 'data-action': a }, a);
      b.addEventListener('click', (ev) => { ev.stopPropagation(); act(job.id, a); });
      actions.appendChild(b);
    }
    tr.appendChild(actions);
    tr.addEventListener('click', () => { selected = job.id; chosenQuantity = null; chosenAxis = null; poll(); });
    body.appendChild(tr);
  }
}

function fillSelect(select, values, chosen) {
  const current = Array.from(select.options).map((o) => o.value).join('\n');
  if (current !== values.join('\n')) {
    select.replaceChildren(...values.map((v) => el('option', { value: v }, v)));
  }
  select.value = chosen;
}

function renderDetail(status) {
  const job = status.job;
  document.getElementById('detail-title').textContent = job.id + ' — ' + job.state;
  const p = status.progress;
  document.getElementById('detail-meta').textContent =
    p.done + ' done, ' + p.failed + ' failed of ' + (p.adaptive ? 'at most ' : '') + p.planned + ' realisations' +
    (p.ratePerSecond ? '; ' + p.ratePerSecond.toFixed(2) + ' realisations/s, ETA ' + duration(p.etaSeconds) : '') +
    (job.message ? ' — ' + job.message : '');
  const quantities = status.quantities.map((q) => q.name);
  if (!chosenQuantity || !quantities.includes(chosenQuantity)) {
    const integer = status.quantities.find((q) => q.integerValued);
    chosenQuantity = integer ? integer.name : quantities[0];
  }
  const axes = status.grid.length ? status.grid : ['(point)'];
  if (!chosenAxis || !axes.includes(chosenAxis)) {
    // prefer a swept parameter that is not the linear size; sizes become the series
    const varying = status.grid.filter((g) => new Set(status.points.map((pt) => pt.coordinates[g])).size > 1);
    chosenAxis = varying.find((g) => g !== 'L') || varying[0] || axes[0];
  }
  const qSelect = document.getElementById('quantity');
  const aSelect = document.getElementById('axis');
  fillSelect(qSelect, quantities, chosenQuantity);
  fillSelect(aSelect, axes, chosenAxis);
  qSelect.onchange = () => { chosenQuantity = qSelect.value; poll(); };
  aSelect.onchange = () => { chosenAxis = aSelect.value; poll(); };
  const downloads = document.getElementById('downloads');
  downloads.replaceChildren();
  for (const [label, href] of [['summary.csv', 'summary.csv'], ['summary.json', 'summary.json']]) {
    downloads.appendChild(el('a', { href: '/api/jobs/' + job.id + '/' + href }, label));
    downloads.appendChild(document.createTextNode(' '));
  }
  if (status.files.report) downloads.appendChild(el('a', { href: '/api/jobs/' + job.id + '/report' }, 'report'));
  drawFigure(status, chosenQuantity, chosenAxis);
  renderPoints(status);
}

function drawFigure(status, quantity, axis) {
  const W = 640, H = 340, left = 60, right = 150, top = 20, bottom = 45;
  const others = status.grid.filter((g) => g !== axis);
  const series = new Map();
  for (const pt of status.points) {
    const q = pt.quantities[quantity];
    if (!q || q.mean === null) continue;
    const key = others.map((g) => g + ' = ' + pt.coordinates[g]).join(', ') || quantity;
    if (!series.has(key)) series.set(key, []);
    const x = axis === '(point)' ? pt.index : pt.coordinates[axis];
    series.get(key).push({ x: x, y: q.mean, e: q.stderr || 0 });
  }
  const all = Array.from(series.values()).flat();
  const root = svg('svg', { id: 'figure-svg', width: W, height: H, viewBox: '0 0 ' + W + ' ' + H, 'data-points': String(all.length) });
  const fig = document.getElementById('figure');
  if (!all.length) {
    root.appendChild(svg('text', { x: left, y: H / 2 }, 'no realisations of ' + quantity + ' yet'));
    fig.replaceChildren(root);
    return;
  }
  let x0 = Math.min(...all.map((d) => d.x)), x1 = Math.max(...all.map((d) => d.x));
  let y0 = Math.min(...all.map((d) => d.y - d.e)), y1 = Math.max(...all.map((d) => d.y + d.e));
  if (x0 === x1) { x0 -= 1; x1 += 1; }
  if (y0 === y1) { y0 -= 0.5; y1 += 0.5; }
  const pad = 0.05 * (y1 - y0);
  y0 -= pad; y1 += pad;
  const sx = (x) => left + (x - x0) / (x1 - x0) * (W - left - right);
  const sy = (y) => H - bottom - (y - y0) / (y1 - y0) * (H - top - bottom);
  for (let i = 0; i <= 5; i++) {
    const xv = x0 + i * (x1 - x0) / 5, yv = y0 + i * (y1 - y0) / 5;
    root.appendChild(svg('line', { class: 'grid', x1: sx(xv), x2: sx(xv), y1: top, y2: H - bottom }));
    root.appendChild(svg('line', { class: 'grid', x1: left, x2: W - right, y1: sy(yv), y2: sy(yv) }));
    root.appendChild(svg('text', { x: sx(xv), y: H - bottom + 15, 'text-anchor': 'middle' }, num(xv, 3)));
    root.appendChild(svg('text', { x: left - 5, y: sy(yv) + 4, 'text-anchor': 'end' }, num(yv, 3)));
  }
  root.appendChild(svg('line', { class: 'axis', x1: left, x2: W - right, y1: H - bottom, y2: H - bottom }));
  root.appendChild(svg('line', { class: 'axis', x1: left, x2: left, y1: top, y2: H - bottom }));
  root.appendChild(svg('text', { x: (left + W - right) / 2, y: H - 8, 'text-anchor': 'middle' }, axis));
  root.appendChild(svg('text', { x: 14, y: (top + H - bottom) / 2, transform: 'rotate(-90 14 ' + (top + H - bottom) / 2 + ')', 'text-anchor': 'middle' },
    quantity + ' (mean ± stderr)'));
  let k = 0;
  for (const [key, data] of series) {
    const colour = COLOURS[k % COLOURS.length];
    data.sort((a, b) => a.x - b.x);
    root.appendChild(svg('polyline', { class: 'series', fill: 'none', stroke: colour, 'stroke-width': 1.5, points: data.map((d) => sx(d.x) + ',' + sy(d.y)).join(' ') }));
    for (const d of data) {
      root.appendChild(svg('line', { class: 'errorbar', stroke: colour, x1: sx(d.x), x2: sx(d.x), y1: sy(d.y - d.e), y2: sy(d.y + d.e) }));
      root.appendChild(svg('circle', { class: 'point', fill: colour, cx: sx(d.x), cy: sy(d.y), r: 3.5 }));
    }
    root.appendChild(svg('rect', { x: W - right + 12, y: top + 16 * k, width: 10, height: 10, fill: colour }));
    root.appendChild(svg('text', { x: W - right + 27, y: top + 9 + 16 * k }, key));
    k++;
  }
  fig.replaceChildren(root);
}

function renderPoints(status) {
  const head = document.querySelector('#points thead');
  const body = document.querySelector('#points tbody');
  const quantities = status.quantities.map((q) => q.name);
  const hr = el('tr');
  for (const h of [...status.grid, 'done / planned', 'failed', ...quantities.map((q) => q + ' (mean ± stderr)'), 'non-quantised']) hr.appendChild(el('th', {}, h));
  head.replaceChildren(hr);
  body.replaceChildren();
  for (const pt of status.points) {
    const tr = el('tr');
    for (const g of status.grid) tr.appendChild(el('td', {}, num(pt.coordinates[g], 4)));
    tr.appendChild(el('td', {}, pt.done + ' / ' + pt.planned));
    const reasons = Object.entries(pt.failureReasons).map(([r, n]) => n + '× ' + r).join('\n');
    tr.appendChild(el('td', { class: pt.failed ? 'warn' : '', title: reasons }, String(pt.failed)));
    let nq = 0;
    for (const q of quantities) {
      const s = pt.quantities[q];
      tr.appendChild(el('td', {}, s ? num(s.mean, 5) + ' ± ' + num(s.stderr, 2) : '–'));
      if (s && s.nonQuantised) nq += s.nonQuantised;
    }
    tr.appendChild(el('td', { class: nq ? 'warn' : '' }, String(nq)));
    body.appendChild(tr);
  }
}

let polling = false;
async function poll() {
  if (polling) return;
  polling = true;
  try {
    const list = await api('/api/jobs');
    document.getElementById('connection').textContent = 'updated ' + new Date().toLocaleTimeString();
    const jobs = list.jobs;
    if (!selected || !jobs.some((j) => j.job.id === selected)) {
      const running = jobs.find((j) => j.job.state === 'RUNNING');
      selected = running ? running.job.id : (jobs.length ? jobs[jobs.length - 1].job.id : null);
    }
    renderQueue(jobs);
    document.getElementById('detail').style.display = selected ? 'block' : 'none';
    if (selected) renderDetail(await api('/api/jobs/' + selected));
  } catch (e) {
    document.getElementById('connection').textContent = 'not connected: ' + e.message;
  } finally {
    polling = false;
  }
}

poll();
setInterval(poll, POLL_MS);
