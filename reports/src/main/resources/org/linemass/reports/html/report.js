document.querySelectorAll('svg.view').forEach(function (svg) {
  var vb = svg.viewBox.baseVal, home = [vb.x, vb.y, vb.width, vb.height], drag = null, moved = false;
  function toView(e) {
    var r = svg.getBoundingClientRect();
    return [vb.x + (e.clientX - r.left) / r.width * vb.width, vb.y + (e.clientY - r.top) / r.height * vb.height];
  }
  svg.addEventListener('wheel', function (e) {
    e.preventDefault();
    var p = toView(e), f = e.deltaY < 0 ? 0.8 : 1.25;
    vb.x = p[0] - (p[0] - vb.x) * f; vb.y = p[1] - (p[1] - vb.y) * f;
    vb.width *= f; vb.height *= f;
  }, {passive: false});
  svg.addEventListener('pointerdown', function (e) { drag = [e.clientX, e.clientY]; moved = false; });
  window.addEventListener('pointerup', function () { drag = null; });
  svg.addEventListener('pointermove', function (e) {
    if (!drag) { return; }
    var r = svg.getBoundingClientRect(), dx = e.clientX - drag[0], dy = e.clientY - drag[1];
    if (Math.abs(dx) + Math.abs(dy) > 3) { moved = true; }
    vb.x -= dx / r.width * vb.width; vb.y -= dy / r.height * vb.height;
    drag = [e.clientX, e.clientY];
  });
  svg.addEventListener('click', function (e) { if (moved) { e.preventDefault(); moved = false; } }, true);
  svg.addEventListener('dblclick', function () { vb.x = home[0]; vb.y = home[1]; vb.width = home[2]; vb.height = home[3]; });
});
