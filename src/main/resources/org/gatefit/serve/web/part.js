'use strict';
(function () {
  const p = G.params();
  const kind = p.get('kind') || 'switch';
  const part = p.get('part') || '';
  const out = document.getElementById('out');
  document.querySelector('h1').textContent = part ? part + ' (' + kind + ')' : 'Part';
  (async function () {
    try {
      const a = await G.api('/api/v1/parts/' + encodeURIComponent(kind) + '/' + encodeURIComponent(part), []);
      const rows = Object.entries(a.json).map(([k, v]) => ({ column: k, value: v === null ? 'unknown' : v }));
      out.appendChild(G.table([{ key: 'column' }, { key: 'value' }], rows));
      const links = document.getElementById('links');
      if (kind === 'switch') links.appendChild(G.link('/switch', [['switch', part]], 'Rank drivers for this switch'));
      links.appendChild(document.createTextNode(' '));
      links.appendChild(G.link('/replace', [['part', part], ['kind', kind]], 'Find substitutes'));
      G.status('');
    } catch (e) {
      G.status(e.message, true);
    }
  })();
})();
