'use strict';
(function () {
  const form = document.getElementById('q');
  const out = document.getElementById('out');
  const downloads = document.getElementById('downloads');

  function body() {
    const fd = new FormData();
    fd.append('stages', form.elements.stages.files[0]);
    if (form.elements.bom.files.length) fd.append('bom', form.elements.bom.files[0]);
    return fd;
  }

  async function download(format, name) {
    try {
      const a = await G.api('/api/v1/check', [['format', format]], { method: 'POST', body: body() });
      const type = { json: 'application/json', junit: 'application/xml', html: 'text/html' }[format];
      const url = URL.createObjectURL(new Blob([a.text], { type }));
      const link = G.el('a', name);
      link.href = url;
      link.download = name;
      link.click();
    } catch (e) {
      G.status(e.message, true);
    }
  }

  async function check() {
    if (!form.elements.stages.files.length) { G.status('choose a stage sheet'); return; }
    G.status('checking\u2026');
    out.replaceChildren();
    downloads.replaceChildren();
    try {
      const a = await G.api('/api/v1/check', [], { method: 'POST', body: body() });
      const r = a.json;
      G.warnings(out, a.warnings);
      const s = r.summary;
      G.status(r.file + ': ' + s.stages + ' stages, ' + s.failed + ' fail, ' + s.warned + ' warn, ' + s.passed + ' pass');
      for (const n of r.bom_notes) out.appendChild(G.el('p', 'BOM: ' + n, 'warning'));
      const cols = [
        { key: 'stage' }, { key: 'line', num: true },
        { key: 'driver', cell: x => (x.driver_ref ? x.driver_ref + ' ' : '') + (x.driver || '') },
        { key: 'switch', cell: x => (x.switch_ref ? x.switch_ref + ' ' : '') + (x.switch || '') },
        { key: 'verdict', cell: x => G.verdict(x.verdict) },
        { key: 'score', num: true },
        { key: 'sheet', cell: x => {
          if (!x.operating_point) return '';
          // The pair's full calculation sheet at this stage's operating point.
          const q = new URLSearchParams([['switch', x.switch], ['driver', x.driver]].concat(G.opParams(x.operating_point)));
          const a = G.el('a', 'calculation sheet');
          a.href = 'pair?' + q.toString();
          if (x.operating_point.twin) {
            // The sheet judges dv-dt on the bridge partner's edge, as this check did (twin-edge above).
            const span = G.el('span');
            span.appendChild(a);
            span.appendChild(G.el('span', ' (dv-dt on ' + x.operating_point.twin.name + '\u2019s turn-on)', 'note'));
            return span;
          }
          return a;
        } },
        { key: 'problems', cell: x => {
          const d = G.el('details');
          const bad = x.checks.filter(c => c.verdict !== 'pass');
          d.appendChild(G.el('summary', bad.length ? bad.map(c => (G.SYMBOL[c.verdict] || '') + ' ' + c.rule).join(', ')
            : 'every check passes'));
          const ul = G.el('ul');
          for (const c of x.checks) {
            const li = G.el('li');
            li.appendChild(G.verdict(c.verdict));
            li.appendChild(document.createTextNode(' ' + c.rule + ': ' + c.message));
            ul.appendChild(li);
          }
          for (const n of x.notes || []) ul.appendChild(G.el('li', 'note: ' + n));
          d.appendChild(ul);
          return d;
        } }];
      out.appendChild(G.table(cols, r.results));
      for (const [format, name, label] of [['json', 'gatefit-check.json', 'JSON'], ['junit', 'gatefit-check.junit.xml',
        'JUnit XML'], ['html', 'gatefit-check.html', 'HTML report']]) {
        const b = G.el('button', 'Download ' + label);
        b.type = 'button';
        b.addEventListener('click', () => download(format, name));
        downloads.appendChild(b);
        downloads.appendChild(document.createTextNode(' '));
      }
    } catch (e) {
      G.status(e.message, true);
    }
  }
  form.addEventListener('submit', ev => { ev.preventDefault(); check(); });
})();
