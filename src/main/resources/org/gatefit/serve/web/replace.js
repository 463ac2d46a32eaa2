'use strict';
(function () {
  const form = document.getElementById('q');
  const out = document.getElementById('out');
  const p = G.params();
  for (const k of ['part', 'kind', 'top']) if (p.get(k) !== null) form.elements[k].value = p.get(k);

  async function search() {
    G.status('searching\u2026');
    out.replaceChildren();
    try {
      const a = await G.api('/api/v1/replace', G.formParams(form));
      const r = a.json;
      G.warnings(out, a.warnings);
      G.status(r.part + ' (' + r.kind + '): ' + r.considered + ' considered, ' + r.candidates.length + ' offered');
      const cols = [
        { key: 'part_number', label: 'part', cell: c => G.link('/part', [['kind', r.kind], ['part', c.part_number]], c.part_number) },
        { key: 'grade' }, { key: 'score', num: true }, { key: 'maker' }, { key: 'lifecycle' },
        { key: 'stock', num: true }, { key: 'unit_price', label: 'price', num: true },
        { key: 'differences', cell: c => {
          const ul = G.el('ul');
          for (const d of c.differences.filter(d => d.assessment !== 'equal')) {
            ul.appendChild(G.el('li', d.parameter + ': ' + d.original + ' \u2192 ' + d.candidate + (d.unit ? ' ' + d.unit : '')
              + ' (' + d.assessment + ')'));
          }
          for (const why of c.reasons || []) ul.appendChild(G.el('li', why));
          return ul;
        } }];
      out.appendChild(G.table(cols, r.candidates));
    } catch (e) {
      G.status(e.message, true);
    }
  }
  form.addEventListener('submit', ev => { ev.preventDefault(); search(); });
  if (form.elements.part.value) search();
})();
