'use strict';
(function () {
  const form = document.getElementById('q');
  G.opForm(document.getElementById('op'));
  const p = G.params();
  form.elements.switch.value = p.get('switch') || '';
  form.elements.drivers.value = p.getAll('driver').join('\n');
  if (!form.elements.freq.value) form.elements.freq.value = '100';

  async function explain() {
    const sw = form.elements.switch.value.trim();
    const drivers = form.elements.drivers.value.split('\n').map(s => s.trim()).filter(s => s);
    if (!sw || !drivers.length) { G.status('name a switch and up to four drivers'); return; }
    if (drivers.length > 4) { G.status('compare up to four drivers at once', true); return; }
    const op = G.formParams(form).filter(([k]) => G.OP.some(o => o[0] === k));
    G.status('explaining\u2026');
    const compare = document.getElementById('compare');
    const sheets = document.getElementById('sheets');
    compare.replaceChildren();
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
  form.addEventListener('submit', ev => { ev.preventDefault(); explain(); });
  if (form.elements.switch.value && form.elements.drivers.value) explain();
})();
