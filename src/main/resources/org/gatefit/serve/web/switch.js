'use strict';
(function () {
  const form = document.getElementById('q');
  const out = document.getElementById('out');
  const head = document.getElementById('head');
  G.opForm(document.getElementById('op'));
  const p = G.params();
  form.elements.switch.value = p.get('switch') || '';
  if (!form.elements.freq.value) form.elements.freq.value = '100';
  let timer = null;
  let asked = 0;

  /** The checks that decide: the failing and warning ones, else the lowest-scoring one. */
  function deciding(c) {
    const bad = c.checks.filter(k => k.verdict !== 'pass');
    const list = bad.length ? bad : [c.checks.reduce((a, b) => (b.score < a.score ? b : a))];
    const ul = G.el('ul');
    for (const k of list) {
      const li = G.el('li');
      li.appendChild(G.verdict(k.verdict));
      li.appendChild(document.createTextNode(' ' + k.rule + ': ' + k.message));
      ul.appendChild(li);
    }
    return ul;
  }

  async function rank() {
    const mine = ++asked;
    const params = G.formParams(form);
    if (!form.elements.switch.value.trim()) { G.status('name a switch'); return; }
    G.status('ranking\u2026');
    try {
      const a = await G.api('/api/v1/shortlist', params);
      if (mine !== asked) return; // a newer question is on its way
      const r = a.json;
      head.replaceChildren();
      out.replaceChildren();
      G.warnings(head, a.warnings);
      head.appendChild(G.el('p', r.switch + ': ' + r.evaluated + ' evaluated, ' + r.passing + ' pass, ' + r.warning
        + ' warn, ' + r.failing + ' fail' + (r.skipped ? ', ' + r.skipped + ' skipped by the prefilter' : ''), 'summary'));
      if (r.switch_status) head.appendChild(G.el('p', 'Switch status: ' + r.switch_status));
      for (const s of r.assumed) head.appendChild(G.el('p', 'Assumed: ' + s, 'assumed'));
      const op = r.operating_point;
      const shown = { bus: op.bus_v, drive: op.v_drive_v, 'drive-neg': op.v_drive_neg_v, rg: op.r_g_ohm,
        'rg-off': op.r_g_off_ohm, side: op.side, logic: op.logic, pwm: op.pwm_sense,
        edge: op.edge_s === null ? null : +(op.edge_s * 1e9).toPrecision(4),
        loop: op.loop_h === null ? null : +(op.loop_h * 1e9).toPrecision(4) };
      for (const [k, v] of Object.entries(shown)) {
        const i = document.getElementById('op-' + k);
        if (i && v !== null && v !== undefined) i.placeholder = String(v);
      }
      const cols = [
        { key: 'rank', num: true },
        { key: 'driver', cell: c => G.link('/pair', [['switch', r.switch], ['driver', c.driver]].concat(
          params.filter(([k]) => G.OP.some(o => o[0] === k))), c.driver) },
        { key: 'verdict', cell: c => G.verdict(c.verdict) },
        { key: 'score', num: true },
        { key: 'unit_price', label: 'price', num: true },
        { key: 'deciding', label: 'deciding checks', cell: deciding }];
      out.appendChild(G.table(cols, r.candidates));
      G.status(r.candidates.length + ' drivers listed');
    } catch (e) {
      if (mine !== asked) return;
      out.replaceChildren();
      G.status(e.message, true);
    }
  }
  function soon() { clearTimeout(timer); timer = setTimeout(rank, 300); }
  form.addEventListener('submit', ev => { ev.preventDefault(); rank(); });
  form.addEventListener('input', soon);
  form.addEventListener('change', soon);
  if (form.elements.switch.value) rank();
})();
