// Hover readout: finds the triangle under the cursor (bucket grid) and interpolates the server's nodal
// heads linearly inside it — display only, the same P1 field the server solved for.

/** Point locator over the field's triangles. */
export class FieldProbe {
  constructor(field) {
    this.field = field;
    const { nodes, triangles } = field;
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (const [x, y] of nodes) { minX = Math.min(minX, x); maxX = Math.max(maxX, x); minY = Math.min(minY, y); maxY = Math.max(maxY, y); }
    // Square cells holding about two triangles each.
    const w = Math.max(maxX - minX, 1e-9), h = Math.max(maxY - minY, 1e-9);
    const cell = Math.sqrt((w * h) / Math.max(1, triangles.length / 2));
    const nx = Math.max(1, Math.min(2000, Math.ceil(w / cell))), ny = Math.max(1, Math.min(2000, Math.ceil(h / cell)));
    this.grid = { minX, minY, nx, ny, dx: w / nx, dy: h / ny };
    this.cells = Array.from({ length: nx * ny }, () => []);
    triangles.forEach((t, k) => {
      const xs = t.map(i => nodes[i][0]), ys = t.map(i => nodes[i][1]);
      const [i0, j0] = this.cellOf(Math.min(...xs), Math.min(...ys));
      const [i1, j1] = this.cellOf(Math.max(...xs), Math.max(...ys));
      for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) this.cells[j * nx + i].push(k);
    });
  }

  cellOf(x, y) {
    const g = this.grid;
    const clamp = (v, m) => Math.min(m - 1, Math.max(0, v));
    return [clamp(Math.floor((x - g.minX) / g.dx), g.nx), clamp(Math.floor((y - g.minY) / g.dy), g.ny)];
  }

  /**
   * { triangle, head (m), gradX, gradY (∂h/∂x, ∂h/∂y from the server, dimensionless) } at (x, y) in metres, or null when the
   * point is outside the mesh.
   */
  at(x, y) {
    const g = this.grid;
    if (x < g.minX - g.dx || y < g.minY - g.dy || x > g.minX + g.dx * (g.nx + 1) || y > g.minY + g.dy * (g.ny + 1)) return null;
    const [i, j] = this.cellOf(x, y);
    const { nodes, triangles, heads } = this.field;
    for (const k of this.cells[j * g.nx + i]) {
      const [a, b, c] = triangles[k];
      const [x1, y1] = nodes[a], [x2, y2] = nodes[b], [x3, y3] = nodes[c];
      const det = (x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1);
      if (Math.abs(det) < 1e-14) continue;
      const l2 = ((x - x1) * (y3 - y1) - (x3 - x1) * (y - y1)) / det;
      const l3 = ((x2 - x1) * (y - y1) - (x - x1) * (y2 - y1)) / det;
      const l1 = 1 - l2 - l3;
      const eps = -1e-9;
      if (l1 < eps || l2 < eps || l3 < eps) continue;
      // The head is interpolated for display; the gradient is the server's, for that triangle.
      const [gradX, gradY] = this.field.gradients?.[k] ?? [NaN, NaN];
      return { triangle: k, head: l1 * heads[a] + l2 * heads[b] + l3 * heads[c], gradX, gradY };
    }
    return null;
  }
}
