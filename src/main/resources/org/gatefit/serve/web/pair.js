'use strict';
(function () {
  const form = document.getElementById('q');
  G.opForm(document.getElementById('op'));
  const p = G.params();
  form.elements.switch.value = p.get('switch') || '';
  form.elements.drivers.value = p.getAll('driver').join('\n');
  if (!form.elements.freq.value) form.elements.freq.value = '100';
  form.elements['twin-edge'].value = p.get('twin-edge') || '';

  async function explain() {
    const sw = form.elements.switch.value.trim();
    const drivers = form.elements.drivers.value.split('\n').map(s => s.trim()).filter(s => s);
    if (!sw || !drivers.length) { G.status('name a switch and up to four drivers'); return; }
    if (drivers.length > 4) { G.status('compare up to four drivers at once', true); return; }
    const op = G.formParams(form).filter(([k]) => k === 'twin-edge' || G.OP.some(o => o[0] === k));
    G.status('explaining\u2026');
    const compare = document.getElementById('compare');
    const sheets = document.getElementById('sheets');
    compare.replaceChildren();
    document.getElementById('overlay').replaceChildren();
    document.getElementById('network').replaceChildren();
    sheets.replaceChildren();
    const results = [];
    try {
      for (const d of drivers) {
        const params = [['switch', sw], ['driver', d]].concat(op);
        const a = await G.api('/api/v1/explain', params);
        results.push({ driver: d, r: a.json, params, warnings: a.warnings });
      }
    } catch (e) {
      G.status(e.message, true);
      return;
    }
    // Side by side: each rule's verdict and sub-score per driver, with a bar for the sub-score.
    const rules = results[0].r.checks.map(c => c.rule);
    const rows = rules.map(rule => {
      const row = { rule };
      for (const x of results) row[x.driver] = x.r.checks.find(c => c.rule === rule);
      return row;
    });
    const cols = [{ key: 'rule' }].concat(results.map(x => ({
      key: x.driver,
      cell: row => {
        const c = row[x.driver];
        const span = G.el('span');
        if (!c) return span;
        span.appendChild(G.verdict(c.verdict));
        const bar = G.el('span', null, 'bar');
        bar.style.width = Math.round(60 * Math.max(0, Math.min(1, c.score))) + 'px';
        bar.title = 'sub-score ' + c.score;
        span.appendChild(document.createTextNode(' ' + c.score + ' '));
        span.appendChild(bar);
        return span;
      }
    })));
    compare.appendChild(G.el('h2', sw + ': ' + results.map(x => x.driver + ' ' + (G.SYMBOL[x.r.verdict] || '') + ' '
      + x.r.verdict + ' (' + x.r.score + ')').join(' \u00B7 ')));
    compare.appendChild(G.table(cols, rows));
    network(results);
    overlay(results);
    // Each pair's calculation sheet with its gate waveforms, step response and margin bars: the
    // command line's own HTML report, framed without scripts.
    for (const x of results) {
      const sec = G.el('section');
      sec.appendChild(G.el('h2', x.driver + ' with ' + sw));
      G.warnings(sec, x.warnings);
      const f = document.createElement('iframe');
      f.setAttribute('sandbox', 'allow-same-origin');
      f.title = 'calculation sheet ' + x.driver;
      const u = new URL('/api/v1/explain', location.origin);
      for (const [k, v] of x.params.concat([['format', 'html']])) u.searchParams.append(k, v);
      f.src = u.pathname + u.search;
      sec.appendChild(f);
      sheets.appendChild(sec);
    }
    G.status(results.length + (results.length === 1 ? ' pair' : ' pairs'));
  }
  // The gate-drive network of each pair, as explain sizes it (the JSON "network": one row per part,
  // a column per driver with the value as the sheet shows it, its rating and why; then what was
  // left out). Only shown here: every figure comes from the answer.
  function network(results) {
    const box = document.getElementById('network');
    const roles = [];
    for (const x of results) {
      for (const p of x.r.network || []) if (!roles.includes(p.role)) roles.push(p.role);
    }
    if (!roles.length) return;
    box.appendChild(G.el('h2', 'Gate-drive network'));
    const cols = [{ key: 'part' }].concat(results.map(x => ({
      key: x.driver,
      cell: row => {
        const p = (x.r.network || []).find(n => n.role === row.part);
        const div = G.el('div');
        if (!p) { div.textContent = '\u2014'; return div; }
        div.appendChild(G.el('strong', p.value_text));
        div.appendChild(G.el('div', 'rating: ' + p.rating));
        div.appendChild(G.el('div', 'why: ' + p.why, 'note'));
        return div;
      }
    })));
    const t = G.table(cols, roles.map(r => ({ part: r })));
    t.className = 'network';
    box.appendChild(t);
    for (const x of results) {
      const left = x.r.network_left_out || [];
      if (!left.length) continue;
      const ul = G.el('ul', null, 'network-notes');
      for (const n of left) ul.appendChild(G.el('li', x.driver + ': left out \u2014 ' + n));
      box.appendChild(ul);
    }
  }
  // The drivers' gate waveforms in one plot per edge (uPlot, served by this server from its
  // WebJar), from the explain JSON's waveforms; each driver a colour and a dash pattern, so the
  // lines part in grey print too.
  const STROKES = ['#1f5fa8', '#b35900', '#2e7d32', '#8e44ad'];
  const DASHES = [[], [8, 4], [2, 3], [10, 3, 2, 3]];
  function overlay(results) {
    const box = document.getElementById('overlay');
    const waves = results.filter(x => x.r.waveforms);
    if (!waves.length) {
      if (results.length) box.appendChild(G.el('p', 'No waveforms: the catalog lacks the switch\u2019s gate-charge figures'
        + ' or the drivers\u2019 output resistances.', 'note'));
      return;
    }
    box.appendChild(G.el('h2', 'Gate waveforms, overlaid (estimate)'));
    for (const [edge, name] of [['turn_on', 'Turn-on'], ['turn_off', 'Turn-off']]) {
      const ws = waves.map(x => x.r.waveforms[edge]);
      const end = Math.max(...ws.map(w => w.time_s[w.time_s.length - 1]));
      const [unit, f] = end < 2e-6 ? ['ns', 1e9] : end < 2e-3 ? ['\u00B5s', 1e6] : ['ms', 1e3];
      const n = 241;
      const t = Array.from({ length: n }, (_, k) => end * k / (n - 1));
      // Each driver's V_GS on the common time grid (held at its last value once its edge is over).
      const data = [t.map(x => x * f)].concat(ws.map(w => t.map(x => at(w.time_s, w.v_gs_v, x))));
      const fig = G.el('figure', null, 'overlay-plot');
      fig.dataset.edge = edge;
      box.appendChild(fig);
      const series = [{ label: 'time (' + unit + ')' }].concat(waves.map((x, i) => ({
        label: x.driver, stroke: STROKES[i], width: 2, dash: DASHES[i]
      })));
      new uPlot({
        title: name + ': V_GS of ' + waves.map(x => x.driver).join(', '),
        width: Math.min(900, Math.max(320, box.clientWidth || 800)), height: 280,
        scales: { x: { time: false } },
        axes: [{ label: 'time (' + unit + ')' }, { label: 'V_GS (V)' }],
        series
      }, data, fig);
      fig.appendChild(G.el('figcaption', name + ' edges of each driver with the switch (the explain sheet\u2019s model:'
        + ' loop inductance ignored). Read the plateau and the time to reach the drive level side by side.'));
    }
  }
  /** Linear interpolation of ys over xs at x, the end values beyond either end. */
  function at(xs, ys, x) {
    if (x <= xs[0]) return ys[0];
    const last = xs.length - 1;
    if (x >= xs[last]) return ys[last];
    let lo = 0;
    let hi = last;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid] <= x) lo = mid; else hi = mid;
    }
    const u = (x - xs[lo]) / (xs[hi] - xs[lo]);
    return ys[lo] + u * (ys[hi] - ys[lo]);
  }
  form.addEventListener('submit', ev => { ev.preventDefault(); explain(); });
  if (form.elements.switch.value && form.elements.drivers.value) explain();
})();
