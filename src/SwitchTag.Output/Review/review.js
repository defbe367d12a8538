// The review page's script. Every click becomes one row of the decisions file (SCHEMA.md), keyed by
// what survives a rerun: a heading by its id, a mention by its interview, time (seconds) and text;
// never by turn number or char offset. A later click on the same thing replaces the earlier one.
'use strict';
const columns = ['action', 'interview', 'label', 'name', 'time', 'turn', 'char', 'value'];
const decisions = new Map();
let order = 0;

for (const cells of JSON.parse(document.getElementById('prior').textContent))
  decisions.set('prior:' + order, { order: order++, cells, prior: true });

function cellsOf(obj) { return columns.map(c => obj[c] ?? ''); }

function decide(key, obj, element, status) {
  decisions.set(key, { order: order++, cells: cellsOf(obj), element, status });
  if (element) {
    element.classList.add('decided');
    element.querySelector('.status').textContent = status;
  }
  show();
}

function undo(key) {
  const d = decisions.get(key);
  decisions.delete(key);
  if (d.element && ![...decisions.values()].some(o => o.element === d.element)) {
    d.element.classList.remove('decided');
    d.element.querySelector('.status').textContent = '';
  }
  show();
}

function show() {
  const list = document.getElementById('decisions');
  list.replaceChildren();
  const sorted = [...decisions.entries()].sort((a, b) => a[1].order - b[1].order);
  for (const [key, d] of sorted) {
    const li = document.createElement('li');
    li.textContent = (d.prior ? '(earlier run) ' : '') + d.cells.filter(c => c !== '').join(' · ') + ' ';
    const button = document.createElement('button');
    button.textContent = 'undo';
    button.addEventListener('click', () => undo(key));
    li.append(button);
    list.append(li);
  }
  document.getElementById('count').textContent = decisions.size;
}

function csv() {
  const quote = v => /[",\r\n]/.test(v) ? '"' + v.replaceAll('"', '""') + '"' : v;
  const rows = [...decisions.values()].sort((a, b) => a.order - b.order).map(d => d.cells.map(quote).join(','));
  return [columns.join(','), ...rows].join('\r\n') + '\r\n';
}

document.getElementById('export').addEventListener('click', () => {
  const text = csv();
  document.getElementById('csv').value = text;
  const link = document.createElement('a');
  link.href = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
  link.download = 'decisions.csv';
  document.body.append(link);
  link.click();
  link.remove();
});

// The merge lists are filled here rather than written into the page, which would grow with the square
// of the number of headings.
for (const table of document.querySelectorAll('section.interview')) {
  const rows = [...table.querySelectorAll('tr.heading')];
  for (const row of rows)
    for (const other of rows)
      if (other !== row)
        row.querySelector('[data-act=merge]').add(new Option(`${other.dataset.name} (${other.dataset.label})`, other.dataset.original));
}

for (const row of document.querySelectorAll('tr.heading')) {
  const interview = row.closest('section.interview').dataset.interview;
  const h = row.dataset;
  const base = () => ({ interview, label: h.label, name: h.id });
  const key = kind => `h:${interview}:${h.original}:${kind}`;
  // Accepting a heading accepts each of its mentions, so a later model that doubts one keeps it indexed.
  row.querySelector('[data-act=accept]').addEventListener('click', () => {
    for (const m of row.nextElementSibling.querySelectorAll('li.mention'))
      decide(`m:${interview}:${m.dataset.time}:${m.dataset.text}:fate`,
        { action: 'accept-mention', interview, name: m.dataset.text, time: m.dataset.time }, m, 'accepted');
    row.classList.add('decided');
    row.querySelector('.status').textContent = 'accepted';
  });
  row.querySelector('[data-act=reject]').addEventListener('click', () =>
    decide(key('fate'), { ...base(), action: 'reject-heading' }, row, 'rejected'));
  row.querySelector('[data-act=relabel]').addEventListener('change', e => {
    if (!e.target.value) return;
    decide(key('label'), { ...base(), action: 'relabel-heading', value: e.target.value }, row, 'relabelled ' + e.target.value);
    // Decisions apply in file order, so later ones name the heading by its id after the relabel.
    h.id = e.target.value.toLowerCase() + h.id.slice(h.id.indexOf('-'));
    h.label = e.target.value;
  });
  row.querySelector('[data-act=rename]').addEventListener('change', e => {
    if (e.target.value.trim())
      decide(key('name'), { ...base(), action: 'rename-heading', value: e.target.value.trim() }, row, 'renamed');
  });
  row.querySelector('[data-act=merge]').addEventListener('change', e => {
    if (!e.target.value) return;
    const into = row.closest('table').querySelector(`tr.heading[data-original="${CSS.escape(e.target.value)}"]`).dataset.id;
    decide(key('fate'), { ...base(), action: 'merge-headings', value: into }, row, 'merged into ' + e.target.selectedOptions[0].textContent);
  });
}

for (const m of document.querySelectorAll('li.mention, tr.held')) {
  const interview = m.closest('section.interview').dataset.interview;
  const base = { interview, name: m.dataset.text, time: m.dataset.time };
  const key = kind => `m:${interview}:${m.dataset.time}:${m.dataset.text}:${kind}`;
  m.querySelector('[data-act=accept]').addEventListener('click', () => decide(key('fate'), { ...base, action: 'accept-mention' }, m, 'accepted'));
  m.querySelector('[data-act=reject]').addEventListener('click', () => decide(key('fate'), { ...base, action: 'reject-mention' }, m, 'rejected'));
  m.querySelector('[data-act=relabel]').addEventListener('change', e => {
    if (e.target.value) decide(key('label'), { ...base, action: 'relabel-mention', value: e.target.value }, m, 'relabelled ' + e.target.value);
  });
}
show();
