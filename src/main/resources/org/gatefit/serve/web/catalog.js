'use strict';
(function () {
  const form = document.getElementById('q');
  const out = document.getElementById('out');
  let sort = '';
  const p = G.params();
  for (const k of ['words', 'kind', 'sort', 'limit']) if (p.get(k) !== null) form.elements[k].value = p.get(k);
  if (p.getAll('where').length) form.elements.where.value = p.getAll('where').join('\n');

  async function search() {
    const params = [];
    for (const [k, v] of G.formParams(form)) {
      if (k === 'where') v.split('\n').map(s => s.trim()).filter(s => s).forEach(w => params.push(['where', w]));
      else params.push([k, v]);
    }
    G.status('searching\u2026');
    try {
      const a = await G.api('/api/v1/find', params);
      const parts = a.json.parts;
      out.replaceChildren();
      G.warnings(out, a.warnings);
      G.status(parts.length + (parts.length === 1 ? ' part' : ' parts'));
      const cols = [
        { key: 'part_number', label: 'part', cell: r => G.link('/part', [['kind', r.kind], ['part', r.part_number]], r.part_number) },
        { key: 'kind' }, { key: 'maker' }, { key: 'package' }, { key: 'lifecycle' },
        { key: 'stock', num: true }, { key: 'unit_price', label: 'price', num: true }, { key: 'description', sort: false }];
      out.appendChild(G.table(cols, parts, key => {
        sort = sort === key ? key + ':desc' : key;
        form.elements.sort.value = sort;
        search();
      }));
    } catch (e) {
      out.replaceChildren();
      G.status(e.message, true);
    }
  }
  form.addEventListener('submit', ev => { ev.preventDefault(); search(); });
  search();
})();
