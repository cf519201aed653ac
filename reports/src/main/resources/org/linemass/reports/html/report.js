// Pan and zoom for every picture; markers, the centre of gravity and the scale bar keep their size
// on screen, and the scale bar is redrawn with a fitting length (the rule of SvgView.ScaleBar).
// Finding markers are clustered at every zoom by the rule of MarkerClusters: each marker not yet
// taken gathers the untaken ones within RADIUS screen pixels; a cluster of more than one marker
// shows one count badge at its first marker, which zooms to its markers when clicked (or, when
// they lie on one spot, fans them all out by the rule of MarkerLayout).
// linemassViews(root) sets up the pictures under root once each; svg.linemassCentre(x, y) moves
// picture point (x, y) to the middle of the view (the local page uses it to show a finding);
// svg.linemassReveal(marker) brings a marker out of its badge.
function linemassViews(root) {
var NS = 'http://www.w3.org/2000/svg', RADIUS = 40, LONE = 20 / Math.SQRT2, PITCH = 24, MIN_FAN = 24;
root.querySelectorAll('svg.view').forEach(function (svg) {
  if (svg.linemassCentre) { return; }
  var vb = svg.viewBox.baseVal, home = [vb.x, vb.y, vb.width, vb.height], drag = null, moved = false;
  var pxPerM = parseFloat(svg.getAttribute('data-px-per-m'));
  var imperial = svg.getAttribute('data-units') === 'imperial';
  var fixed = Array.prototype.filter.call(svg.querySelectorAll('[data-x]'), function (g) {
    return !g.classList.contains('marker') && !g.classList.contains('cluster');
  });
  var bar = svg.querySelector('g.scale');
  Array.prototype.forEach.call(svg.querySelectorAll('g.cluster'), function (g) { g.parentNode.removeChild(g); });
  var markers = Array.prototype.map.call(svg.querySelectorAll('a.marker'), function (a) {
    var ball = a.querySelector('circle.balloon');
    return {el: a, x: parseFloat(a.getAttribute('data-x')), y: parseFloat(a.getAttribute('data-y')),
      r: parseFloat(ball.getAttribute('r')), ball: ball, line: a.querySelector('line'), text: a.querySelector('text'),
      sev: a.classList.contains('error') ? 2 : a.classList.contains('warning') ? 1 : 0, shown: null, dx: null, dy: null};
  });
  var layer = document.createElementNS(NS, 'g');
  layer.setAttribute('class', 'clusters');
  svg.appendChild(layer);
  var clusteredAt = null, spread = {};
  function nice(x) {
    var p = Math.pow(10, Math.floor(Math.log10(x))), m = x / p;
    return parseFloat(((m >= 5 ? 5 : m >= 2 ? 2 : 1) * p).toPrecision(12));
  }
  function place(m, dx, dy, s) {
    if (m.shown !== true) { m.el.removeAttribute('display'); m.shown = true; }
    m.el.setAttribute('transform', 'translate(' + m.x + ',' + m.y + ') scale(' + s + ')');
    if (m.dx === dx && m.dy === dy) { return; }
    m.dx = dx; m.dy = dy;
    var len = Math.hypot(dx, dy), lead = Math.max(0, len - m.r) / Math.max(len, 1);
    m.ball.setAttribute('cx', dx.toFixed(2)); m.ball.setAttribute('cy', dy.toFixed(2));
    m.line.setAttribute('x2', (dx * lead).toFixed(2)); m.line.setAttribute('y2', (dy * lead).toFixed(2));
    m.text.setAttribute('x', dx.toFixed(2)); m.text.setAttribute('y', (dy + (m.r < 10 ? 3 : 4)).toFixed(2));
  }
  function hide(m) {
    if (m.shown !== false) { m.el.setAttribute('display', 'none'); m.shown = false; }
  }
  function bearing(dx, dy) {
    if (Math.hypot(dx, dy) < 1e-6) { return 0; }
    var a = Math.atan2(dx, -dy);
    return a < 0 ? a + 2 * Math.PI : a;
  }
  // the balloons of ms on one circle about their centre, in the order of their bearings (MarkerLayout)
  function fan(ms, s) {
    var cx = 0, cy = 0;
    ms.forEach(function (m) { cx += m.x / ms.length; cy += m.y / ms.length; });
    ms.sort(function (a, b) { return bearing(a.x - cx, a.y - cy) - bearing(b.x - cx, b.y - cy); });
    var radius = Math.max(MIN_FAN, ms.length * PITCH / (2 * Math.PI));
    ms.forEach(function (m, k) {
      var a = 2 * Math.PI * k / ms.length;
      place(m, (cx - m.x) / s + radius * Math.sin(a), (cy - m.y) / s - radius * Math.cos(a), s);
    });
  }
  function badge(key, ms, s) {
    var worst = 0, seed = ms[0];
    ms.forEach(function (m) { if (m.i === key) { seed = m; } worst = Math.max(worst, m.sev); });
    var g = document.createElementNS(NS, 'g'), ring = document.createElementNS(NS, 'circle');
    var lead = document.createElementNS(NS, 'line'), c = document.createElementNS(NS, 'rect');
    var t = document.createElementNS(NS, 'text'), title = document.createElementNS(NS, 'title');
    g.setAttribute('class', 'cluster fixed ' + ['info', 'warning', 'error'][worst]);
    g.setAttribute('data-x', String(seed.x)); g.setAttribute('data-y', String(seed.y));
    g.setAttribute('transform', 'translate(' + seed.x + ',' + seed.y + ') scale(' + s + ')');
    ring.setAttribute('class', 'ring'); ring.setAttribute('r', '5');
    lead.setAttribute('x1', '0'); lead.setAttribute('y1', '0');
    lead.setAttribute('x2', LONE.toFixed(2)); lead.setAttribute('y2', (-LONE).toFixed(2));
    var bw = 16 + 7 * String(ms.length).length;
    c.setAttribute('x', (LONE - bw / 2).toFixed(2)); c.setAttribute('y', (-LONE - 10).toFixed(2));
    c.setAttribute('width', String(bw)); c.setAttribute('height', '20'); c.setAttribute('rx', '10');
    t.setAttribute('x', LONE.toFixed(2)); t.setAttribute('y', (-LONE + 4).toFixed(2));
    t.textContent = '\u00d7' + ms.length;
    title.textContent = ms.length + ' findings here: click or zoom in to see them';
    g.appendChild(title); g.appendChild(ring); g.appendChild(lead); g.appendChild(c); g.appendChild(t);
    g.addEventListener('click', function (e) {
      e.preventDefault(); e.stopPropagation();
      if (moved) { return; }
      var x0 = ms[0].x, y0 = ms[0].y, x1 = x0, y1 = y0;
      ms.forEach(function (m) { x0 = Math.min(x0, m.x); y0 = Math.min(y0, m.y); x1 = Math.max(x1, m.x); y1 = Math.max(y1, m.y); });
      if (Math.max(x1 - x0, y1 - y0) / s < 2) { spread[key] = true; cluster(true); return; }
      // zoom so the badge's markers fill the middle half of the view
      var f = Math.max((x1 - x0) * 2 / vb.width, (y1 - y0) * 2 / vb.height);
      var w = vb.width * f, h = vb.height * f;
      vb.x = (x0 + x1) / 2 - w / 2; vb.y = (y0 + y1) / 2 - h / 2; vb.width = w; vb.height = h;
      redraw();
    });
    layer.appendChild(g);
  }
  function cluster(force) {
    var s = vb.width / home[2];
    if (!force && s === clusteredAt) { return; }
    if (s !== clusteredAt) { spread = {}; }
    clusteredAt = s;
    while (layer.firstChild) { layer.removeChild(layer.firstChild); }
    var grid = new Map(), size = RADIUS * s;
    markers.forEach(function (m, i) {
      m.i = i; m.taken = false; m.cx = Math.floor(m.x / size); m.cy = Math.floor(m.y / size);
      var key = m.cx + ',' + m.cy, c = grid.get(key);
      if (!c) { c = []; grid.set(key, c); }
      c.push(m);
    });
    markers.forEach(function (m) {
      if (m.taken) { return; }
      var ms = [];
      for (var gx = m.cx - 1; gx <= m.cx + 1; gx++) {
        for (var gy = m.cy - 1; gy <= m.cy + 1; gy++) {
          (grid.get(gx + ',' + gy) || []).forEach(function (o) {
            if (!o.taken && Math.hypot(o.x - m.x, o.y - m.y) <= size) { o.taken = true; ms.push(o); }
          });
        }
      }
      ms.sort(function (a, b) { return a.i - b.i; });
      m.seed = m.i;
      ms.forEach(function (o) { o.seed = m.i; });
      if (ms.length === 1) { place(ms[0], LONE, -LONE, s); }
      else if (spread[m.i]) { fan(ms, s); }
      else { ms.forEach(hide); badge(m.i, ms, s); }
    });
  }
  function redraw() {
    var s = vb.width / home[2];
    fixed.forEach(function (g) {
      g.setAttribute('transform', 'translate(' + g.getAttribute('data-x') + ',' + g.getAttribute('data-y') + ') scale(' + s + ')');
    });
    cluster(false);
    if (bar && pxPerM > 0) {
      var longM = imperial ? 0.3048 : 1, shortM = imperial ? 0.0254 : 0.001;
      var wanted = 192 * s / pxPerM, n, metres, label;
      if (wanted >= longM) { n = nice(wanted / longM); metres = n * longM; label = n + (imperial ? ' ft' : ' m'); }
      else { n = nice(wanted / shortM); metres = n * shortM; label = n + (imperial ? ' in' : ' mm'); }
      var px = metres * pxPerM / s, y = home[3] - 18;
      bar.setAttribute('transform', 'translate(' + vb.x + ',' + vb.y + ') scale(' + s + ')');
      bar.querySelector('path').setAttribute('d', 'M40,' + (y - 5) + ' v5 h' + px + ' v-5');
      var t = bar.querySelector('text');
      t.setAttribute('x', 46 + px); t.textContent = label;
    }
  }
  function toView(e) {
    var r = svg.getBoundingClientRect();
    return [vb.x + (e.clientX - r.left) / r.width * vb.width, vb.y + (e.clientY - r.top) / r.height * vb.height];
  }
  svg.addEventListener('wheel', function (e) {
    e.preventDefault();
    var p = toView(e), f = e.deltaY < 0 ? 0.8 : 1.25;
    vb.x = p[0] - (p[0] - vb.x) * f; vb.y = p[1] - (p[1] - vb.y) * f;
    vb.width *= f; vb.height *= f;
    redraw();
  }, {passive: false});
  svg.addEventListener('pointerdown', function (e) { drag = [e.clientX, e.clientY]; moved = false; });
  window.addEventListener('pointerup', function () { drag = null; });
  svg.addEventListener('pointermove', function (e) {
    if (!drag) { return; }
    var r = svg.getBoundingClientRect(), dx = e.clientX - drag[0], dy = e.clientY - drag[1];
    if (Math.abs(dx) + Math.abs(dy) > 3) { moved = true; }
    vb.x -= dx / r.width * vb.width; vb.y -= dy / r.height * vb.height;
    drag = [e.clientX, e.clientY];
    if (bar) { redraw(); }
  });
  svg.addEventListener('click', function (e) { if (moved) { e.preventDefault(); moved = false; } }, true);
  svg.addEventListener('dblclick', function () {
    vb.x = home[0]; vb.y = home[1]; vb.width = home[2]; vb.height = home[3];
    redraw();
  });
  svg.linemassCentre = function (x, y) {
    vb.x = x - vb.width / 2; vb.y = y - vb.height / 2;
    redraw();
  };
  svg.linemassReveal = function (el) {
    var m = null;
    markers.forEach(function (k) { if (k.el === el) { m = k; } });
    if (!m || m.shown) { return; }
    spread[m.seed] = true;
    cluster(true);
  };
  redraw();
});
}
// alike findings: their group row's button shows or hides their own rows; a link to a hidden row opens its group
function linemassGroups(root) {
  function open(id, show) {
    var b = root.querySelector('button.open-group[data-group="' + id + '"]');
    Array.prototype.forEach.call(root.querySelectorAll('tr.member[data-group="' + id + '"]'), function (tr) { tr.hidden = !show; });
    if (b) { b.setAttribute('aria-expanded', String(show)); b.textContent = (show ? 'hide the ' : 'list the ') + b.getAttribute('data-count'); }
  }
  root.addEventListener('click', function (e) {
    var b = e.target.closest ? e.target.closest('button.open-group') : null;
    if (b) { open(b.getAttribute('data-group'), b.getAttribute('aria-expanded') !== 'true'); }
  });
  function follow() {
    var id = decodeURIComponent(location.hash.slice(1)), el = id ? document.getElementById(id) : null;
    if (!el) { return; }
    if (el.hidden && el.getAttribute('data-group')) { open(el.getAttribute('data-group'), true); el.scrollIntoView(); }
    if (el.classList.contains('marker') && el.ownerSVGElement && el.ownerSVGElement.linemassReveal) {
      el.ownerSVGElement.linemassReveal(el);
    }
  }
  window.addEventListener('hashchange', follow);
  follow();
}
linemassViews(document);
if (document.querySelector('table.findings')) { linemassGroups(document); }
