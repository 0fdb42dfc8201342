/* coilwise report: sorts a table by the clicked column heading. No network, no libraries. */
(function () {
  "use strict";
  function cellKey(row, col) {
    var cell = row.cells[col];
    if (!cell) { return ""; }
    var v = cell.getAttribute("data-v");
    return v === null ? cell.textContent.trim().toLowerCase() : parseFloat(v);
  }
  function sortBy(table, col, th) {
    var body = table.tBodies[0];
    var rows = Array.prototype.slice.call(body.rows);
    var dir = th.getAttribute("aria-sort") === "ascending" ? -1 : 1;
    rows.sort(function (a, b) {
      var x = cellKey(a, col), y = cellKey(b, col);
      if (typeof x === "number" && typeof y === "number") { return dir * (x - y); }
      return dir * String(x).localeCompare(String(y));
    });
    rows.forEach(function (r) { body.appendChild(r); });
    Array.prototype.forEach.call(th.parentNode.cells, function (h) { h.setAttribute("aria-sort", "none"); });
    th.setAttribute("aria-sort", dir === 1 ? "ascending" : "descending");
  }
  var tables = document.querySelectorAll("table.sortable");
  Array.prototype.forEach.call(tables, function (table) {
    if (!table.tHead || !table.tBodies.length) { return; }
    Array.prototype.forEach.call(table.tHead.rows[0].cells, function (th, col) {
      th.tabIndex = 0;
      th.setAttribute("aria-sort", "none");
      th.title = "Sort by this column";
      th.addEventListener("click", function () { sortBy(table, col, th); });
      th.addEventListener("keydown", function (e) {
        if (e.key === "Enter" || e.key === " ") { e.preventDefault(); sortBy(table, col, th); }
      });
    });
  });
  document.documentElement.setAttribute("data-sortable-tables", String(tables.length));
}());
