// The local page of 'linemass serve'. Every text that comes from a drawing is put in with
// textContent; only the picture, escaped by the report writer on the server, goes in as markup.
(function () {
  'use strict';
  var token = document.querySelector('meta[name="linemass-token"]').content;
  var maxUpload = parseInt(document.querySelector('meta[name="linemass-max-upload"]').content, 10);
  var session = null, polling = false, shown = {}, sectionsKey = '';

  function el(tag, attrs, text) {
    var e = document.createElement(tag);
    if (attrs) { Object.keys(attrs).forEach(function (k) { e.setAttribute(k, attrs[k]); }); }
    if (text !== undefined && text !== null) { e.textContent = text; }
    return e;
  }
  function say(text) {
    var m = document.getElementById('message');
    m.textContent = text || '';
    m.hidden = !text;
  }
  function api(method, path, body, type) {
    var headers = {'X-Linemass-Token': token};
    if (session) { headers['X-Linemass-Session'] = session; }
    if (type) { headers['Content-Type'] = type; }
    return fetch(path, {method: method, headers: headers, body: body}).then(function (r) {
      if (r.status === 204) { return null; }
      return r.json().then(function (j) {
        if (!r.ok) { throw new Error(j && j.error ? j.error : 'the server answered ' + r.status); }
        return j;
      });
    });
  }
  function fail(e) { say(e.message); }

  function kg(v) { return v === null || v === undefined ? 'no section' : v.toFixed(Math.abs(v) < 1 ? 4 : 3) + ' kg'; }
  function metres(v) { return v.toFixed(3) + ' m'; }
  function mm(v) { return (v * 1000).toFixed(1) + ' mm'; }
  function xyz(p) { return p ? '(' + p.map(function (c) { return c.toFixed(3); }).join(', ') + ') m' : '-'; }
  function cell(tr, text, value, cls) {
    var td = el('td', cls ? {'class': cls} : null, text);
    if (value !== undefined && value !== null) { td.setAttribute('data-value', String(value)); }
    tr.appendChild(td);
    return td;
  }
  function table(cls, heads) {
    var t = el('table', {'class': cls}), tr = el('tr');
    heads.forEach(function (h) { tr.appendChild(el('th', null, h)); });
    t.appendChild(el('thead')).appendChild(tr);
    t.appendChild(el('tbody'));
    return t;
  }
  function download(kind, id, label) {
    var href = '/api/download/' + kind + '?session=' + encodeURIComponent(session) + (id ? '&drawing=' + id : '');
    return el('a', {href: href, download: '', 'data-kind': kind}, label);
  }

  function upload(files) {
    say('');
    Array.prototype.forEach.call(files, function (f) {
      if (f.size > maxUpload) {
        say(f.name + ' is larger than the server takes (' + Math.round(maxUpload / 1048576) + ' MB); start it with a larger --max-upload');
        return;
      }
      api('POST', '/api/drawings?name=' + encodeURIComponent(f.name), f, 'application/octet-stream')
        .then(poll).catch(fail);
    });
  }
  function sendCsv(path, file) {
    say('');
    api('POST', path + '?name=' + encodeURIComponent(file.name), file, 'text/csv')
      .then(function () { shown = {}; return poll(); }).catch(fail);
  }

  function poll() {
    return api('GET', '/api/state').then(function (state) {
      render(state);
      var busy = state.drawings.some(function (d) { return d.status === 'working'; });
      if (busy && !polling) {
        polling = true;
        setTimeout(function () { polling = false; poll(); }, 250);
      }
    }).catch(fail);
  }

  function render(state) {
    var key = state.sections.map(function (s) { return s.id; }).join('\n');
    if (key !== sectionsKey) {
      sectionsKey = key;
      var dl = document.getElementById('section-ids');
      dl.textContent = '';
      state.sections.forEach(function (s) {
        dl.appendChild(el('option', {value: s.id}, s.id + ' - ' + s.description + ' (' + s.kg_per_m.toFixed(4) + ' kg/m)'));
      });
    }
    var up = document.getElementById('uploads');
    up.textContent = [state.section_table ? 'section table: ' + state.section_table : '',
      state.assignments ? 'assignment file: ' + state.assignments : ''].filter(Boolean).join('; ');
    jobs(state);
    combined(state);
    var holder = document.getElementById('drawings'), keep = {};
    state.drawings.forEach(function (d) {
      if (d.status !== 'done') { return; }
      keep[d.id] = true;
      var box = document.getElementById('drawing-' + d.id);
      if (!box) {
        box = el('section', {'class': 'drawing', id: 'drawing-' + d.id});
        holder.appendChild(box);
      }
      if (shown[d.id] !== d.revision) {
        shown[d.id] = d.revision;
        api('GET', '/api/drawings/' + d.id).then(function (full) { drawing(box, d, full, state); }).catch(fail);
      }
    });
    Array.prototype.slice.call(holder.children).forEach(function (box) {
      if (!keep[box.id.substring(8)]) { holder.removeChild(box); delete shown[box.id.substring(8)]; }
    });
  }

  function jobs(state) {
    var j = document.getElementById('jobs');
    j.textContent = '';
    state.drawings.forEach(function (d) {
      if (d.status === 'working') {
        var p = el('p', {'class': 'job'});
        p.appendChild(el('strong', null, d.name));
        p.appendChild(el('progress'));
        p.appendChild(el('span', {'class': 'stage'}, d.stage));
        var b = el('button', {type: 'button', 'class': 'cancel'}, 'Cancel');
        b.addEventListener('click', function () { api('POST', '/api/drawings/' + d.id + '/cancel').then(poll).catch(fail); });
        p.appendChild(document.createTextNode(' '));
        p.appendChild(b);
        j.appendChild(p);
      } else if (d.status === 'refused' || d.status === 'cancelled') {
        var r = el('p', {'class': 'refused'});
        r.appendChild(el('span', {'class': 'why'}, d.message));
        var x = el('button', {type: 'button'}, 'Remove');
        x.addEventListener('click', function () { api('DELETE', '/api/drawings/' + d.id).then(poll).catch(fail); });
        r.appendChild(document.createTextNode(' '));
        r.appendChild(x);
        j.appendChild(r);
      }
    });
  }

  function combined(state) {
    var c = document.getElementById('combined');
    c.textContent = '';
    if (!state.combined) { c.hidden = true; return; }
    c.hidden = false;
    var n = state.combined.drawings, t = state.combined.totals;
    c.appendChild(el('h2', null, n === 1 ? 'The drawing' : 'All ' + n + ' drawings together'));
    var p = el('p', {'class': 'totals'});
    p.appendChild(el('span', null, 'Length '));
    p.appendChild(el('strong', {id: 'combined-length', 'data-value': String(t.length_m)}, metres(t.length_m)));
    p.appendChild(el('span', null, ', mass '));
    p.appendChild(el('strong', {id: 'combined-mass', 'data-value': String(t.mass_kg)}, kg(t.mass_kg)));
    if (!t.mass_complete) { p.appendChild(el('span', {'class': 'note'}, ' (some layers have no section; their mass is left out)')); }
    c.appendChild(p);
    var bill = table('bill', ['Section', 'Pieces', 'Cut length', 'Mass']);
    state.combined.bill.forEach(function (b) {
      var tr = el('tr');
      cell(tr, b.section || 'no section');
      cell(tr, String(b.pieces), b.pieces, 'n');
      cell(tr, metres(b.length_m), b.length_m, 'n');
      cell(tr, kg(b.mass_kg), b.mass_kg, 'n');
      bill.tBodies[0].appendChild(tr);
    });
    c.appendChild(el('h3', null, 'Combined bill of materials by section'));
    c.appendChild(bill);
    var dl = el('p', {'class': 'downloads'});
    dl.appendChild(el('span', null, 'Download all: '));
    [['report.xlsx', 'spreadsheet (.xlsx)'], ['bom.csv', 'bill (CSV)'], ['pieces.csv', 'pieces (CSV)'],
      ['findings.csv', 'findings (CSV)'], ['report.json', 'JSON'], ['report.html', 'HTML report'],
      ['assignments.csv', 'assignment file']].forEach(function (k) {
      dl.appendChild(download(k[0], null, k[1]));
    });
    c.appendChild(dl);
  }

  function drawing(box, d, full, state) {
    var r = full.report, id = d.id;
    box.textContent = '';
    var h = el('h2', null, d.name);
    var x = el('button', {type: 'button', 'class': 'remove'}, 'Remove');
    x.addEventListener('click', function () { api('DELETE', '/api/drawings/' + id).then(poll).catch(fail); });
    h.appendChild(document.createTextNode(' '));
    h.appendChild(x);
    box.appendChild(h);
    if (!r.complete) {
      var inc = el('div', {'class': 'incomplete'});
      inc.appendChild(el('strong', null, 'Totals are incomplete. '));
      r.incomplete_reasons.forEach(function (why) { inc.appendChild(el('p', null, why)); });
      box.appendChild(inc);
    }
    var sum = table('totals summary', ['Length', 'Mass', 'Centre of gravity', 'Pieces', 'Marks', 'Findings']);
    var tr = el('tr');
    cell(tr, metres(r.totals.length_m), r.totals.length_m, 'n length');
    cell(tr, kg(r.totals.mass_kg), r.totals.mass_kg, 'n mass');
    cell(tr, xyz(r.totals.centroid_m || r.totals.length_centroid_m), null, 'xyz');
    cell(tr, String(r.pieces.length), r.pieces.length, 'n');
    cell(tr, String(r.groups.length), r.groups.length, 'n');
    cell(tr, String(r.findings.length), r.findings.length, 'n');
    sum.tBodies[0].appendChild(tr);
    box.appendChild(sum);
    var dl = el('p', {'class': 'downloads'});
    dl.appendChild(el('span', null, 'Download: '));
    [['report.xlsx', 'spreadsheet (.xlsx)'], ['bom.csv', 'bill (CSV)'], ['pieces.csv', 'pieces (CSV)'],
      ['findings.csv', 'findings (CSV)'], ['report.json', 'JSON'], ['report.html', 'HTML report'],
      ['markup.dxf', 'marked-up DXF']].forEach(function (k) {
      dl.appendChild(download(k[0], id, k[1]));
    });
    box.appendChild(dl);

    var panes = el('div', {'class': 'panes'}), pic = el('div', {'class': 'picture'}), info = el('div', {'class': 'piece-info'});
    info.appendChild(el('p', {'class': 'note'}, 'Click a piece in the picture to see its length, mass, bends, centre of gravity and the DXF entities it came from.'));
    pic.innerHTML = full.picture;
    panes.appendChild(pic);
    panes.appendChild(info);
    box.appendChild(panes);
    linemassViews(pic);
    pic.addEventListener('click', function (e) {
      var line = e.target.closest ? e.target.closest('polyline.piece') : null;
      if (!line) { return; }
      pieceInfo(info, pic, r, parseInt(line.getAttribute('data-piece'), 10));
    });

    box.appendChild(el('h3', null, 'Layers'));
    var layers = table('layers', ['Layer', 'Section', 'Pieces', 'Length', 'Mass']);
    r.layers.forEach(function (l) {
      var row = el('tr');
      cell(row, l.name, null, 'layer-name');
      var td = el('td'), input = el('input', {'class': 'pick', list: 'section-ids', 'aria-label': 'section of layer ' + l.name,
        placeholder: 'pick a section', 'data-layer': l.name});
      input.value = state.picks[l.name] || l.section || '';
      input.addEventListener('change', function () {
        say('');
        api('POST', '/api/picks', JSON.stringify({layer: l.name, section: input.value}), 'application/json')
          .then(poll).catch(function (e) { input.value = state.picks[l.name] || l.section || ''; fail(e); });
      });
      td.appendChild(input);
      row.appendChild(td);
      cell(row, String(l.pieces), l.pieces, 'n');
      cell(row, metres(l.length_m), l.length_m, 'n');
      cell(row, kg(l.mass_kg), l.mass_kg, 'n layer-mass');
      layers.tBodies[0].appendChild(row);
    });
    box.appendChild(layers);

    box.appendChild(el('h3', null, 'Bill of materials'));
    var bom = table('bom', ['Mark', 'Quantity', 'Section', 'Cut length each', 'Bends each', 'Mass each', 'Mass total', 'Layer']);
    r.groups.forEach(function (g) {
      var row = el('tr');
      cell(row, g.mark);
      cell(row, String(g.quantity), g.quantity, 'n');
      cell(row, g.section || 'no section');
      cell(row, mm(g.length_each_m), g.length_each_m, 'n');
      cell(row, String(g.bends_each), g.bends_each, 'n');
      cell(row, kg(g.mass_each_kg), g.mass_each_kg, 'n');
      cell(row, kg(g.mass_total_kg), g.mass_total_kg, 'n');
      cell(row, g.layer);
      bom.tBodies[0].appendChild(row);
    });
    box.appendChild(bom);

    box.appendChild(el('h3', null, 'Findings'));
    if (!r.findings.length) { box.appendChild(el('p', null, 'No findings.')); }
    var ol = el('ol', {'class': 'findings'});
    function item(n) {
      var f = r.findings[n - 1];
      var li = el('li', {'class': 'finding ' + f.severity, id: 'd' + id + '-finding-' + n, 'data-n': String(n), value: String(n)});
      li.appendChild(el('span', {'class': 'sev'}, f.severity === 'info' ? 'note' : f.severity));
      li.appendChild(document.createTextNode(' '));
      li.appendChild(el('span', {'class': 'what'}, f.message));
      li.addEventListener('click', function (e) { e.stopPropagation(); showFinding(pic, ol, li, id, n); });
      return li;
    }
    // alike findings share one entry; its button shows their own entries
    (full.finding_groups || []).forEach(function (g) {
      if (g.numbers.length === 1) { ol.appendChild(item(g.numbers[0])); return; }
      var li = el('li', {'class': 'group ' + g.severity, value: String(g.numbers[0])});
      li.appendChild(el('span', {'class': 'sev'}, g.severity === 'info' ? 'note' : g.severity));
      li.appendChild(document.createTextNode(' '));
      li.appendChild(el('strong', {'class': 'headline'}, g.headline));
      li.appendChild(el('span', {'class': 'what'}, ': ' + g.message + ' '));
      var button = el('button', {type: 'button', 'class': 'open-group', 'aria-expanded': 'false'}, 'list the ' + g.numbers.length);
      var inner = el('ol', {'class': 'members'});
      inner.hidden = true;
      g.numbers.forEach(function (n) { inner.appendChild(item(n)); });
      button.addEventListener('click', function (e) {
        e.stopPropagation();
        inner.hidden = !inner.hidden;
        button.setAttribute('aria-expanded', String(!inner.hidden));
        button.textContent = (inner.hidden ? 'list the ' : 'hide the ') + g.numbers.length;
      });
      li.appendChild(button);
      li.appendChild(inner);
      ol.appendChild(li);
    });
    box.appendChild(ol);
  }

  function showFinding(pic, ol, li, id, n) {
    Array.prototype.forEach.call(ol.querySelectorAll('li.hit'), function (o) { o.classList.remove('hit'); });
    Array.prototype.forEach.call(pic.querySelectorAll('.marker.hit'), function (o) { o.classList.remove('hit'); });
    li.classList.add('hit');
    var group = li.parentNode;
    if (group && group.hidden) {
      group.hidden = false;
      var b = group.parentNode.querySelector('button.open-group');
      if (b) { b.setAttribute('aria-expanded', 'true'); b.textContent = 'hide the ' + group.children.length; }
    }
    var m = pic.querySelector('[id="d' + id + '-marker-' + n + '"]');
    if (!m) { say('Finding ' + n + ' has no place in the drawing.'); return; }
    say('');
    m.classList.add('hit');
    var svg = m.ownerSVGElement;
    if (svg && svg.linemassReveal) { svg.linemassReveal(m); }
    if (svg && svg.linemassCentre) {
      svg.linemassCentre(parseFloat(m.getAttribute('data-x')), parseFloat(m.getAttribute('data-y')));
    }
    svg.scrollIntoView({block: 'nearest'});
  }

  function pieceInfo(info, pic, r, pid) {
    var p = null;
    r.pieces.forEach(function (q) { if (q.id === pid) { p = q; } });
    if (!p) { return; }
    Array.prototype.forEach.call(pic.querySelectorAll('polyline.chosen'), function (o) { o.classList.remove('chosen'); });
    Array.prototype.forEach.call(pic.querySelectorAll('polyline[data-piece="' + pid + '"]'), function (o) { o.classList.add('chosen'); });
    info.textContent = '';
    info.appendChild(el('h3', null, 'Piece ' + p.id + (p.group ? ', mark ' + p.group : '')));
    var dlist = el('dl');
    function row(k, v) { dlist.appendChild(el('dt', null, k)); dlist.appendChild(el('dd', null, v)); }
    row('Layer', p.layer);
    row('Section', p.section || 'no section');
    row('Length', metres(p.length_m));
    row('Mass', kg(p.mass_kg));
    row('Centre of gravity', xyz(p.centroid_m));
    row('Bends', p.bends.length ? p.bends.map(function (b) { return b.angle_deg.toFixed(1) + '\u00b0 r ' + mm(b.inside_radius_m); }).join('; ') : 'none');
    row('DXF entities', p.sources.map(function (s) { return s.type + ' at line ' + s.line + (s.handle ? ', handle ' + s.handle : ''); }).join('; '));
    info.appendChild(dlist);
  }

  var drop = document.getElementById('drop');
  ['dragenter', 'dragover'].forEach(function (t) {
    document.addEventListener(t, function (e) { e.preventDefault(); drop.classList.add('over'); });
  });
  document.addEventListener('dragleave', function () { drop.classList.remove('over'); });
  document.addEventListener('drop', function (e) {
    e.preventDefault();
    drop.classList.remove('over');
    if (e.dataTransfer && e.dataTransfer.files.length) { upload(e.dataTransfer.files); }
  });
  document.getElementById('files').addEventListener('change', function (e) { upload(e.target.files); e.target.value = ''; });
  document.getElementById('table').addEventListener('change', function (e) {
    if (e.target.files.length) { sendCsv('/api/section-table', e.target.files[0]); } e.target.value = '';
  });
  document.getElementById('rules').addEventListener('change', function (e) {
    if (e.target.files.length) { sendCsv('/api/assignments', e.target.files[0]); } e.target.value = '';
  });
  window.addEventListener('pagehide', function () {
    if (session) { fetch('/api/session', {method: 'DELETE', keepalive: true, headers: {'X-Linemass-Token': token, 'X-Linemass-Session': session}}); }
  });
  api('POST', '/api/sessions').then(function (j) {
    session = j.session;
    document.body.setAttribute('data-ready', 'true');
    return poll();
  }).catch(fail);
}());
