// Pan and zoom for every picture; markers, the centre of gravity and the scale bar keep their size
// on screen, and the scale bar is redrawn with a fitting length (the rule of SvgView.ScaleBar).
// linemassViews(root) sets up the pictures under root once each; svg.linemassCentre(x, y) moves
// picture point (x, y) to the middle of the view (the local page uses it to show a finding).
function linemassViews(root) {
root.querySelectorAll('svg.view').forEach(function (svg) {
  if (svg.linemassCentre) { return; }
  var vb = svg.viewBox.baseVal, home = [vb.x, vb.y, vb.width, vb.height], drag = null, moved = false;
  var pxPerM = parseFloat(svg.getAttribute('data-px-per-m'));
  var imperial = svg.getAttribute('data-units') === 'imperial';
  var fixed = svg.querySelectorAll('[data-x]'), bar = svg.querySelector('g.scale');
  function nice(x) {
    var p = Math.pow(10, Math.floor(Math.log10(x))), m = x / p;
    return parseFloat(((m >= 5 ? 5 : m >= 2 ? 2 : 1) * p).toPrecision(12));
  }
  function redraw() {
    var s = vb.width / home[2];
    fixed.forEach(function (g) {
      g.setAttribute('transform', 'translate(' + g.getAttribute('data-x') + ',' + g.getAttribute('data-y') + ') scale(' + s + ')');
    });
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
    redraw();
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
});
}
linemassViews(document);
