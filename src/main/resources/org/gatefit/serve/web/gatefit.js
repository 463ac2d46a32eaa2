'use strict';
/* Shared by every page. Catalog text only ever goes in through textContent. */
const G = {
  SYMBOL: { pass: '\u2714', warn: '\u25B2', fail: '\u2716', unknown: '?' },

  el(tag, text, cls) {
    const e = document.createElement(tag);
    if (text !== undefined && text !== null) e.textContent = String(text);
    if (cls) e.className = cls;
    return e;
  },

  /** A link built from a path and parameters (never from markup). */
  link(path, params, text) {
    const u = new URL(path, location.origin);
    for (const [k, v] of params) u.searchParams.append(k, v);
    const a = G.el('a', text);
    a.href = u.pathname + u.search;
    return a;
  },

  /** The verdict as symbol and word, coloured as well. */
  verdict(v) {
    return G.el('span', (G.SYMBOL[v] || '') + ' ' + v, 'v-' + v);
  },

  /** Fetches an API answer; throws an Error carrying the server's message. */
  async api(path, params, init) {
    const u = new URL(path, location.origin);
    for (const [k, v] of params || []) u.searchParams.append(k, v);
    const r = await fetch(u.pathname + u.search, init);
    const text = await r.text();
    let json = null;
    try { json = JSON.parse(text); } catch (e) { json = null; }
    const warnings = (r.headers.get('Gatefit-Warning') || '').split(', ').filter(s => s)
      .map(s => decodeURIComponent(s.replace(/\+/g, ' ')));
    if (!r.ok) {
      const err = new Error(json && json.message ? json.message : r.status + ' ' + text);
      err.status = r.status;
      throw err;
    }
    return { json, text, warnings, exit: r.headers.get('Gatefit-Exit-Code') };
  },

  status(msg, isError) {
    const s = document.getElementById('status');
    s.textContent = msg;
    s.className = isError ? 'error' : '';
  },

  warnings(target, list) {
    for (const w of list) target.appendChild(G.el('p', 'warning: ' + w, 'warning'));
  },

  /** A table: columns [{key, label, num, cell(row) -> Node|string}] */
  table(columns, rows, onSort) {
    const t = G.el('table');
    const head = t.createTHead().insertRow();
    for (const c of columns) {
      const th = G.el('th', c.label || c.key);
      if (onSort && c.sort !== false) {
        th.className = 'sortable';
        th.title = 'sort by ' + c.key;
        th.addEventListener('click', () => onSort(c.key));
      }
      head.appendChild(th);
    }
    const body = t.createTBody();
    for (const r of rows) {
      const tr = body.insertRow();
      for (const c of columns) {
        const td = tr.insertCell();
        const v = c.cell ? c.cell(r) : r[c.key];
        if (v instanceof Node) td.appendChild(v);
        else td.textContent = v === null || v === undefined ? '' : String(v);
        if (c.num) td.className = 'num';
      }
    }
    return t;
  },

  /** The page's query parameters. */
  params() { return new URLSearchParams(location.search); },

  /** The shortlist and explain operating-point options: name, label, unit hint. */
  OP: [['side', 'side', 'low|high'], ['bus', 'bus', 'V'], ['freq', 'frequency', 'kHz'], ['edge', 'edge', 'ns'],
    ['drive', 'on level', 'V'], ['drive-neg', 'off level', 'V'], ['logic', 'logic family', ''], ['v-oh', 'V_OH', 'V'],
    ['v-ol', 'V_OL', 'V'], ['pwm', 'PWM sense', 'active-high|active-low'], ['rg', 'R_g on', '\u03A9'],
    ['rg-off', 'R_g off', '\u03A9'], ['duty-max', 'duty max', '0..1'], ['parallel', 'parallel', 'n'],
    ['loop', 'gate loop', 'nH'], ['v-f-boot', 'bootstrap diode', 'V'], ['r-boot', 'bootstrap R', '\u03A9'],
    ['dvdt', 'dv/dt', 'V/ns'], ['tj', 'hot corner', '\u00B0C'], ['bridge', 'in a bridge', 'yes|no'],
    ['power-loop', 'power loop', 'nH'], ['load', 'load current', 'A']],

  /**
   * A stage's operating point (the JSON "operating_point" of check and explain) as the explain
   * options, so a design row can open its pair's calculation sheet with the same point.
   */
  opParams(op) {
    if (!op) return [];
    const n = v => (v === null || v === undefined ? null : String(+(+v).toPrecision(6)));
    // A value the JSON leaves null stays unsaid (null * 1e9 would be 0 in JavaScript: a power loop of
    // 0 nH instead of an unknown one).
    const scaled = (v, k) => (v === null || v === undefined ? null : n(v * k));
    const out = [['side', op.side], ['bus', n(op.bus_v)], ['freq', scaled(op.f_sw_hz, 1e-3)], ['edge', scaled(op.edge_s, 1e9)],
      ['drive', n(op.v_drive_v)], ['drive-neg', n(op.v_drive_neg_v)],
      ['pwm', op.pwm_sense], ['rg', n(op.r_g_ohm)], ['rg-off', n(op.r_g_off_ohm)], ['duty-max', n(op.duty_max)],
      ['parallel', n(op.parallel)], ['loop', scaled(op.loop_h, 1e9)], ['v-f-boot', n(op.v_f_boot_v)],
      ['r-boot', n(op.r_boot_ohm)], ['dvdt', n(op.dv_dt_v_per_ns)], ['tj', n(op.t_j_c)],
      ['bridge', op.bridge === undefined ? null : (op.bridge ? 'yes' : 'no')],
      ['power-loop', scaled(op.power_loop_h, 1e9)], ['load', n(op.i_load_a)]];
    if (op.logic) out.push(['logic', op.logic]);
    else out.push(['v-oh', n(op.v_oh_v)], ['v-ol', n(op.v_ol_v)]);
    // A bridge stage's dv-dt is judged on its partner's turn-on edge (check): carried in full
    // precision, so the pair page judges the same edge.
    if (op.twin) out.push(['twin-edge', G.twinEdge(op.twin)]);
    return out.filter(([, v]) => v !== null && v !== undefined && v !== 'NaN');
  },

  /** The JSON operating_point.twin as explain's --twin-edge value NAME=COLD,HOT (V/ns). */
  twinEdge(t) {
    return t.name + '=' + String(t.dv_dt_25c_v_per_ns) + ',' + String(t.dv_dt_tj_v_per_ns);
  },

  /** Fills the operating-point fieldset, values from the page's query. */
  opForm(fieldset) {
    const p = G.params();
    for (const [name, label, unit] of G.OP) {
      const l = G.el('label', label + (unit ? ' (' + unit + ') ' : ' '));
      const i = document.createElement('input');
      i.name = name;
      i.id = 'op-' + name;
      i.value = p.get(name) || '';
      l.appendChild(i);
      fieldset.appendChild(l);
    }
  },

  /** Non-empty form fields as parameters (files excluded). */
  formParams(form) {
    const out = [];
    for (const [k, v] of new FormData(form)) {
      if (typeof v === 'string' && v.trim() !== '') out.push([k, v.trim()]);
    }
    return out;
  }
};
