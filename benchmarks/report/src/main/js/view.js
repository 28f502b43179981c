// Trundle's report view: reads the JSON that the runner embeds in report.html and builds the page.
// Bundled with three.js by build.mjs into one script (report-view.js) that the report inlines.
import * as THREE from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';

const SVG = 'http://www.w3.org/2000/svg';

function el(tag, attrs, parent, text) {
  const e = tag.startsWith('svg:') ? document.createElementNS(SVG, tag.slice(4)) : document.createElement(tag);
  for (const k in attrs || {}) e.setAttribute(k, attrs[k]);
  if (text !== undefined) e.textContent = text;
  if (parent) parent.appendChild(e);
  return e;
}

function fmt(v, digits = 4) {
  if (v === null || v === undefined || Number.isNaN(v)) return '–';
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e5 || a < 1e-3) return v.toExponential(digits - 1);
  return Number(v.toPrecision(digits)).toString();
}

// Round axis steps: 1, 2 or 5 times a power of ten (common practice), ticks computed from their index.
function niceScale(min, max, maxTicks) {
  if (!(max > min)) { const p = Math.abs(min) > 0 ? Math.abs(min) * 0.1 : 1e-3; min -= p; max += p; }
  const exp = Math.floor(Math.log10((max - min) / maxTicks));
  for (let e = exp - 1; e <= exp + 2; e++) {
    for (const m of [1, 2, 5]) {
      const step = m * Math.pow(10, e);
      const lo = Math.floor(min / step), hi = Math.ceil(max / step);
      if (hi - lo <= maxTicks) {
        const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
        const ticks = [];
        for (let k = lo; k <= hi; k++) ticks.push({ v: k * step, s: (k * step).toFixed(decimals).replace(/^-0(\.0*)?$/, '0') });
        return { lo: lo * step, hi: hi * step, ticks };
      }
    }
  }
  return { lo: min, hi: max, ticks: [] };
}

// A line chart in SVG: x against y, coloured by phase or in one colour, with a cursor linked to the slider.
class LineChart {
  constructor(parent, title, xTitle, yTitle, onPick) {
    this.w = 460; this.h = 190;
    this.m = { l: 62, r: 12, t: 24, b: 38 };
    const box = el('div', { class: 'chart' }, parent);
    this.svg = el('svg:svg', { viewBox: `0 0 ${this.w} ${this.h}`, width: this.w, height: this.h, role: 'img' }, box);
    el('svg:text', { x: this.m.l, y: 15, class: 'ctitle' }, this.svg, title);
    el('svg:text', { x: this.m.l + (this.w - this.m.l - this.m.r) / 2, y: this.h - 4, class: 'atitle', 'text-anchor': 'middle' }, this.svg, xTitle);
    el('svg:text', { x: -(this.m.t + (this.h - this.m.t - this.m.b) / 2), y: 13, class: 'atitle', transform: 'rotate(-90)', 'text-anchor': 'middle' }, this.svg, yTitle);
    this.plot = el('svg:g', {}, this.svg);
    this.cursor = el('svg:line', { class: 'cursor', y1: this.m.t, y2: this.h - this.m.b }, this.svg);
    this.dot = el('svg:circle', { r: 4, class: 'cursordot' }, this.svg);
    this.svg.addEventListener('click', (ev) => {
      const r = this.svg.getBoundingClientRect();
      const px = (ev.clientX - r.left) * this.w / r.width;
      if (onPick && this.sx) onPick(this.sx.invert(px));
    });
  }
  draw(xs, ys, colors, wrapY) {
    const fx = xs.filter(Number.isFinite), fy = ys.filter(Number.isFinite);
    if (!fx.length || !fy.length) { el('svg:text', { x: 80, y: 90, class: 'atitle' }, this.plot, 'no data'); return; }
    const pw = this.w - this.m.l - this.m.r, ph = this.h - this.m.t - this.m.b;
    const xsScale = niceScale(Math.min(...fx), Math.max(...fx), Math.max(2, Math.floor(pw / 70)));
    let ymin = Math.min(...fy), ymax = Math.max(...fy);
    const pad = ymax > ymin ? 0.04 * (ymax - ymin) : 0;
    const ysScale = niceScale(ymin - pad, ymax + pad, 5);
    const X = (v) => this.m.l + (v - xsScale.lo) / (xsScale.hi - xsScale.lo) * pw;
    const Y = (v) => this.m.t + ph - (v - ysScale.lo) / (ysScale.hi - ysScale.lo) * ph;
    X.invert = (p) => xsScale.lo + (p - this.m.l) / pw * (xsScale.hi - xsScale.lo);
    this.sx = X; this.sy = Y;
    for (const t of xsScale.ticks) {
      el('svg:line', { x1: X(t.v), x2: X(t.v), y1: this.m.t, y2: this.m.t + ph, class: 'grid' }, this.plot);
      el('svg:text', { x: X(t.v), y: this.m.t + ph + 14, class: 'tick', 'text-anchor': 'middle' }, this.plot, t.s);
    }
    for (const t of ysScale.ticks) {
      el('svg:line', { x1: this.m.l, x2: this.m.l + pw, y1: Y(t.v), y2: Y(t.v), class: 'grid' }, this.plot);
      el('svg:text', { x: this.m.l - 5, y: Y(t.v) + 4, class: 'tick', 'text-anchor': 'end' }, this.plot, t.s);
    }
    el('svg:rect', { x: this.m.l, y: this.m.t, width: pw, height: ph, class: 'frame' }, this.plot);
    let pts = [], col = null;
    const flush = () => { if (pts.length > 1) el('svg:polyline', { points: pts.join(' '), stroke: col, class: 'series' }, this.plot); pts = []; };
    for (let i = 0; i < xs.length; i++) {
      const c = typeof colors === 'string' ? colors : colors[i];
      if (!Number.isFinite(xs[i]) || !Number.isFinite(ys[i])) { flush(); continue; }
      if (wrapY && i > 0 && Math.abs(ys[i] - ys[i - 1]) > Math.PI) flush();
      if (c !== col) { const last = pts[pts.length - 1]; flush(); if (last) pts.push(last); col = c; }
      pts.push(`${X(xs[i]).toFixed(1)},${Y(ys[i]).toFixed(1)}`);
    }
    flush();
    this.xs = xs; this.ys = ys;
  }
  mark(i) {
    if (!this.sx || !Number.isFinite(this.xs[i])) return;
    const x = this.sx(this.xs[i]);
    this.cursor.setAttribute('x1', x); this.cursor.setAttribute('x2', x);
    if (Number.isFinite(this.ys[i])) { this.dot.setAttribute('cx', x); this.dot.setAttribute('cy', this.sy(this.ys[i])); }
  }
}

function energyChart(parent, energy) {
  const items = [
    ['initial energy', energy.initial, 'in'],
    ['final energy', energy.final, 'out'],
    ['sliding friction loss', energy.sliding_friction, 'loss'],
    ['rolling resistance loss', energy.rolling_resistance, 'loss'],
    ['pivoting resistance loss', energy.pivoting_resistance, 'loss'],
    ['other couples loss', energy.other_couples, 'loss'],
    ['impact loss', energy.impact, 'loss'],
    ['work of applied loads', energy.applied_work, 'in'],
    ['residual (budget error)', energy.residual, 'res'],
  ];
  const w = 460, rowH = 20, left = 170, top = 24;
  const h = top + items.length * rowH + 30;
  const box = el('div', { class: 'chart' }, parent);
  const svg = el('svg:svg', { viewBox: `0 0 ${w} ${h}`, width: w, height: h, id: 'energy' }, box);
  el('svg:text', { x: 8, y: 15, class: 'ctitle' }, svg, 'Energy budget (J)');
  const max = Math.max(...items.map((it) => Math.abs(it[1] || 0)), 1e-300);
  items.forEach((it, k) => {
    const y = top + k * rowH;
    const v = it[1] || 0;
    const len = Math.abs(v) / max * (w - left - 90);
    el('svg:text', { x: left - 6, y: y + 13, class: 'tick', 'text-anchor': 'end' }, svg, it[0]);
    el('svg:rect', { x: left, y: y + 3, width: Math.max(len, 0.5), height: rowH - 6, class: 'bar ' + it[2] }, svg);
    el('svg:text', { x: left + len + 5, y: y + 13, class: 'tick' }, svg, fmt(v) + ' J');
  });
  el('svg:text', { x: 8, y: h - 8, class: 'tick' }, svg,
    `residual = final − initial + losses − applied work = ${fmt(energy.residual, 3)} J (${fmt(energy.relative_residual, 2)} of scale)`);
}

function summaryTable(parent, rows) {
  const t = el('table', { class: 'summary' }, parent);
  for (const [k, v] of rows) { const tr = el('tr', {}, t); el('th', {}, tr, k); el('td', {}, tr, v); }
  return t;
}

function css(hex) { return '#' + hex.toString(16).padStart(6, '0'); }

function runView(data, root) {
  const S = data.samples;
  const n = S.t.length;
  const phaseColor = (p) => css(data.palette.phases[p]);
  const colors = S.phase.map(phaseColor);

  const head = el('header', {}, root);
  el('h1', {}, head, data.title);
  el('p', { class: 'outcome' }, head, data.outcome);
  const legend = el('p', { class: 'legend' }, head);
  data.palette.phase_names.forEach((name, p) => {
    const s = el('span', { class: 'key' }, legend);
    el('i', { style: `background:${phaseColor(p)}` }, s); s.appendChild(document.createTextNode(name));
  });
  Object.entries(data.palette.events).forEach(([kind, c]) => {
    const s = el('span', { class: 'key' }, legend);
    el('b', { style: `color:${css(c)}` }, s, '◆'); s.appendChild(document.createTextNode('event: ' + kind));
  });

  const main = el('div', { class: 'main' }, root);
  const left = el('section', { class: 'scene' }, main);
  const right = el('section', { class: 'side' }, main);
  const plots = el('section', { class: 'plots' }, main);

  // ---- 3-D scene
  const holder = el('div', { id: 'scene', class: 'canvasbox' }, left);
  const tip = el('div', { class: 'tip', id: 'tip' }, holder);
  const renderer = new THREE.WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
  renderer.setPixelRatio(1);
  renderer.setSize(720, 520);
  renderer.setClearColor(0xf4f5f8);
  holder.appendChild(renderer.domElement);
  const scene = new THREE.Scene();
  const up = new THREE.Vector3(...data.up);
  const camera = new THREE.PerspectiveCamera(40, 720 / 520, 1e-5, 1e4);
  camera.up.copy(up);
  scene.add(new THREE.HemisphereLight(0xffffff, 0x8890a0, 2.2));
  const sun = new THREE.DirectionalLight(0xffffff, 1.6);
  scene.add(sun);

  const bounds = new THREE.Box3();
  const path = [];
  for (let i = 0; i < n; i++) { const p = new THREE.Vector3(S.x[i], S.y[i], S.z[i]); path.push(p); bounds.expandByPoint(p); }

  if (data.mesh && data.mesh.triangles.length) {
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.Float32BufferAttribute(data.mesh.vertices, 3));
    g.setIndex(data.mesh.triangles);
    g.computeVertexNormals();
    g.computeBoundingBox();
    bounds.union(g.boundingBox);
    const skin = new THREE.Mesh(g, new THREE.MeshStandardMaterial({
      color: 0x8fa8c4, roughness: 0.6, metalness: 0.05, transparent: true, opacity: 0.32, side: THREE.DoubleSide, depthWrite: false }));
    skin.renderOrder = 2;
    scene.add(skin);
    const wire = new THREE.Mesh(g, new THREE.MeshBasicMaterial({ color: 0x506078, wireframe: true, transparent: true, opacity: 0.10, depthWrite: false }));
    wire.renderOrder = 3;
    scene.add(wire);
  }
  const lineGeom = new THREE.BufferGeometry().setFromPoints(path);
  const vc = [];
  for (const c of colors) { const k = new THREE.Color(c); vc.push(k.r, k.g, k.b); }
  lineGeom.setAttribute('color', new THREE.Float32BufferAttribute(vc, 3));
  scene.add(new THREE.Line(lineGeom, new THREE.LineBasicMaterial({ vertexColors: true })));

  const size = bounds.getSize(new THREE.Vector3());
  const span = Math.max(size.x, size.y, size.z, 4 * data.ball_radius, 1e-3);
  // the camera frames the path (a few ball radii round it) so the ball is seen; zoom out for the whole patch
  const pathBox = new THREE.Box3().setFromPoints(path.length ? path : [bounds.getCenter(new THREE.Vector3())]);
  pathBox.expandByScalar(3 * data.ball_radius);
  const pathSize = pathBox.getSize(new THREE.Vector3());
  const viewSpan = Math.max(pathSize.x, pathSize.y, pathSize.z, 1e-3);
  const centre = pathBox.getCenter(new THREE.Vector3());

  // world axes: lines from the lowest corner, with HTML labels
  const axisLen = (() => { const l = 0.2 * span, p = Math.pow(10, Math.floor(Math.log10(l))), m = l / p; return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p; })();
  const origin = bounds.min.clone();
  const axisLabels = [];
  ['x', 'y', 'z'].forEach((name, a) => {
    const d = new THREE.Vector3(a === 0 ? 1 : 0, a === 1 ? 1 : 0, a === 2 ? 1 : 0);
    const colour = data.palette.axes[a];
    const g = new THREE.BufferGeometry().setFromPoints([origin, origin.clone().addScaledVector(d, axisLen)]);
    scene.add(new THREE.Line(g, new THREE.LineBasicMaterial({ color: colour })));
    const lab = el('div', { class: 'axislabel', style: `color:${css(colour)}` }, holder, name);
    axisLabels.push([lab, origin.clone().addScaledVector(d, axisLen * 1.12)]);
  });
  el('div', { class: 'scalenote' }, holder, `axes ${axisLen < 1 ? fmt(axisLen * 1000, 3) + ' mm' : fmt(axisLen, 3) + ' m'} long, from (${fmt(origin.x, 3)}, ${fmt(origin.y, 3)}, ${fmt(origin.z, 3)}) m; drag: orbit, right-drag: pan, wheel: zoom`);

  // events as markers, details on hover
  const markers = [];
  const evGeom = new THREE.OctahedronGeometry(Math.max(data.ball_radius * 0.6, span * 0.006));
  for (const e of data.events) {
    const m = new THREE.Mesh(evGeom, new THREE.MeshBasicMaterial({ color: data.palette.events[e.kind] }));
    m.position.set(e.x, e.y, e.z);
    m.userData = e;
    m.renderOrder = 4;
    scene.add(m); markers.push(m);
  }

  // the ball, with a dark band round one great circle and a dot at one pole so its spin shows
  const ball = new THREE.Group();
  const r = data.ball_radius;
  ball.add(new THREE.Mesh(new THREE.SphereGeometry(r, 32, 16), new THREE.MeshStandardMaterial({ color: 0xd8dce4, metalness: 0.3, roughness: 0.35 })));
  const band = new THREE.Mesh(new THREE.TorusGeometry(r * 1.005, r * 0.09, 8, 48), new THREE.MeshStandardMaterial({ color: 0xc2410c }));
  ball.add(band);
  const pole = new THREE.Mesh(new THREE.SphereGeometry(r * 0.28, 16, 8), new THREE.MeshStandardMaterial({ color: 0x1e293b }));
  pole.position.set(0, 0, r * 0.92);
  ball.add(pole);
  ball.renderOrder = 5;
  scene.add(ball);

  const fov = THREE.MathUtils.degToRad(camera.fov);
  const dist = 0.75 * viewSpan / Math.tan(fov / 2);
  const e1 = Math.abs(up.x) < 0.9 ? new THREE.Vector3(1, 0, 0) : new THREE.Vector3(0, 1, 0);
  e1.addScaledVector(up, -e1.dot(up)).normalize();
  const e2 = new THREE.Vector3().crossVectors(up, e1);
  const view = e1.clone().multiplyScalar(Math.cos(0.38) * Math.cos(0.61)).addScaledVector(e2, Math.cos(0.38) * Math.sin(0.61)).addScaledVector(up, Math.sin(0.38));
  camera.position.copy(centre).addScaledVector(view, dist);
  camera.near = dist / 1000; camera.far = (dist + 2 * span) * 10; camera.updateProjectionMatrix();
  sun.position.copy(camera.position).addScaledVector(up, dist);
  const controls = new OrbitControls(camera, renderer.domElement);
  controls.target.copy(centre);
  controls.update();

  const ray = new THREE.Raycaster();
  const mouse = new THREE.Vector2();
  renderer.domElement.addEventListener('pointermove', (ev) => {
    const b = renderer.domElement.getBoundingClientRect();
    mouse.set((ev.clientX - b.left) / b.width * 2 - 1, -(ev.clientY - b.top) / b.height * 2 + 1);
    ray.setFromCamera(mouse, camera);
    const hit = ray.intersectObjects(markers)[0];
    if (hit) {
      const e = hit.object.userData;
      tip.style.display = 'block';
      tip.style.left = (ev.clientX - b.left + 12) + 'px';
      tip.style.top = (ev.clientY - b.top + 12) + 'px';
      tip.textContent = eventText(e);
    } else tip.style.display = 'none';
  });

  // ---- time slider and play button
  const bar = el('div', { class: 'timebar' }, left);
  const play = el('button', { id: 'play', type: 'button' }, bar, 'Play');
  const slider = el('input', { id: 'time', type: 'range', min: 0, max: Math.max(0, n - 1), step: 1, value: 0, 'aria-label': 'time (s)' }, bar);
  const readout = el('span', { class: 'readout', id: 'readout' }, bar);

  // ---- numbers and plots
  summaryTable(right, data.summary);
  if (data.energy.initial !== undefined) energyChart(right, data.energy);
  const charts = [];
  const pick = (t) => { let k = 0; while (k + 1 < n && S.t[k + 1] <= t) k++; setIndex(k); };
  const add = (title, yTitle, ys, col, xs = S.t, xTitle = 'time t (s)', wrap = false) => {
    const c = new LineChart(plots, title, xTitle, yTitle, xs === S.t ? pick : null);
    c.draw(xs, ys, col, wrap); charts.push(c);
  };
  add('Speed of the centre', 'speed |v| (m/s)', S.speed, colors);
  add('Height of the centre', 'height h (m, along −g)', S.height, colors);
  add('Normal contact force', 'normal force F_n (N)', S.normal, css(0x333640));
  add('Friction force', 'friction force |F_t| (N)', S.friction, css(0xc85a14));
  if (data.coordinates.length >= 2) {
    const [a, b] = data.coordinates;
    add(`Surface coordinate: ${a.name}`, `${a.name} (${a.unit})`, S.u, colors);
    add(`Surface coordinate: ${b.name}`, `${b.name} (${b.unit})`, S.v, colors, S.t, 'time t (s)', b.unit === 'rad');
  }
  const evTable = el('table', { class: 'events' }, right);
  const hr = el('tr', {}, evTable);
  ['event', 'time (s)', 'speed (m/s)', 'detail'].forEach((h) => el('th', {}, hr, h));
  for (const e of data.events) {
    const tr = el('tr', { title: eventText(e) }, evTable);
    el('td', {}, tr, e.kind); el('td', {}, tr, fmt(e.t, 6)); el('td', {}, tr, fmt(e.speed)); el('td', {}, tr, e.detail || '');
    tr.addEventListener('click', () => pick(e.t));
  }
  if (data.events_left_out > 0) el('p', { class: 'note' }, right, `${data.events_left_out} more events not listed`);

  let index = 0;
  const q = new THREE.Quaternion();
  function setIndex(i) {
    index = Math.max(0, Math.min(n - 1, i));
    slider.value = index;
    ball.position.set(S.x[index], S.y[index], S.z[index]);
    q.set(S.qx[index], S.qy[index], S.qz[index], S.qw[index]);
    ball.quaternion.copy(q);
    holder.dataset.ball = `${S.x[index]},${S.y[index]},${S.z[index]}`;
    readout.textContent = `t = ${fmt(S.t[index], 5)} s · ${data.palette.phase_names[S.phase[index]]} · speed ${fmt(S.speed[index])} m/s`;
    for (const c of charts) c.mark(index);
  }
  slider.addEventListener('input', () => setIndex(Number(slider.value)));
  let playing = false, playStart = 0, playFrom = 0;
  const playSeconds = 8; // the whole run plays in about this wall time
  play.addEventListener('click', () => {
    playing = !playing;
    play.textContent = playing ? 'Pause' : 'Play';
    if (playing) { if (index >= n - 1) setIndex(0); playStart = performance.now(); playFrom = S.t[index]; }
  });
  const tEnd = S.t[n - 1], t0 = S.t[0];
  function frame(now) {
    if (playing) {
      const t = playFrom + (now - playStart) / 1000 / playSeconds * (tEnd - t0);
      let k = index; while (k + 1 < n && S.t[k + 1] <= t) k++;
      setIndex(k);
      if (k >= n - 1) { playing = false; play.textContent = 'Play'; }
    }
    controls.update();
    renderer.render(scene, camera);
    const b = renderer.domElement;
    for (const [lab, p] of axisLabels) {
      const s = p.clone().project(camera);
      lab.style.left = ((s.x + 1) / 2 * b.clientWidth) + 'px';
      lab.style.top = ((1 - s.y) / 2 * b.clientHeight) + 'px';
    }
    requestAnimationFrame(frame);
  }
  setIndex(0);
  requestAnimationFrame(frame);
  document.body.dataset.ready = 'true';
}

function eventText(e) {
  return `${e.kind} at t = ${fmt(e.t, 6)} s; centre (${fmt(e.x)}, ${fmt(e.y)}, ${fmt(e.z)}) m; speed ${fmt(e.speed)} m/s`
    + (e.detail ? `; ${e.detail}` : '');
}

function sweepView(data, root) {
  const head = el('header', {}, root);
  el('h1', {}, head, data.title);
  el('p', { class: 'outcome' }, head, data.subtitle);
  const main = el('div', { class: 'main' }, root);
  const left = el('section', { class: 'scene' }, main);
  const right = el('section', { class: 'side' }, main);
  const w = 720, h = 520, m = { l: 72, r: 16, t: 16, b: 46 };
  const svg = el('svg:svg', { viewBox: `0 0 ${w} ${h}`, width: w, height: h, id: 'map' }, left);
  const P = data.points;
  const xs = P.map((p) => p.x), ys = P.map((p) => p.y);
  const padded = (v) => { const lo = Math.min(...v), hi = Math.max(...v), p = 0.05 * (hi - lo); return niceScale(lo - p, hi + p, 8); };
  const sx = padded(xs), sy = padded(ys);
  const pw = w - m.l - m.r, ph = h - m.t - m.b;
  const X = (v) => m.l + (v - sx.lo) / (sx.hi - sx.lo || 1) * pw;
  const Y = (v) => m.t + ph - (v - sy.lo) / (sy.hi - sy.lo || 1) * ph;
  for (const t of sx.ticks) { el('svg:line', { x1: X(t.v), x2: X(t.v), y1: m.t, y2: m.t + ph, class: 'grid' }, svg); el('svg:text', { x: X(t.v), y: m.t + ph + 15, class: 'tick', 'text-anchor': 'middle' }, svg, t.s); }
  for (const t of sy.ticks) { el('svg:line', { x1: m.l, x2: m.l + pw, y1: Y(t.v), y2: Y(t.v), class: 'grid' }, svg); el('svg:text', { x: m.l - 5, y: Y(t.v) + 4, class: 'tick', 'text-anchor': 'end' }, svg, t.s); }
  el('svg:rect', { x: m.l, y: m.t, width: pw, height: ph, class: 'frame' }, svg);
  el('svg:text', { x: m.l + pw / 2, y: h - 6, class: 'atitle', 'text-anchor': 'middle' }, svg, data.x_title);
  el('svg:text', { x: -(m.t + ph / 2), y: 14, class: 'atitle', transform: 'rotate(-90)', 'text-anchor': 'middle' }, svg, data.y_title);
  const details = el('div', { class: 'details', id: 'details' }, right);
  el('p', {}, details, 'Click a point to see its run.');
  const legend = el('p', { class: 'legend' }, right);
  for (const [o, info] of Object.entries(data.outcomes)) {
    const s = el('span', { class: 'key' }, legend);
    el('i', { style: `background:${css(info.color)}` }, s); s.appendChild(document.createTextNode(`${info.label} (${o}, ${info.count})`));
  }
  P.forEach((p, k) => {
    const c = el('svg:circle', { cx: X(p.x), cy: Y(p.y), r: P.length > 2000 ? 2.5 : 5, fill: css(data.outcomes[p.o].color), class: 'pt' }, svg);
    c.addEventListener('click', () => {
      details.textContent = '';
      el('h2', {}, details, `Run ${p.row[0]}`);
      summaryTable(details, data.columns.map((name, i) => [name, p.row[i]]));
    });
    if (k === 0) c.id = 'first-point';
  });
  if (data.left_out > 0) el('p', { class: 'note' }, right, `${data.left_out} more runs are in the sweep table only`);
  document.body.dataset.ready = 'true';
}

const data = JSON.parse(document.getElementById('trundle-data').textContent);
const root = document.getElementById('trundle-root');
if (data.kind === 'sweep') sweepView(data, root); else runView(data, root);
