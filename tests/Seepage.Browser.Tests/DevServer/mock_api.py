#!/usr/bin/env python3
"""Development stand-in for the Seepage API, for looking at the page before the real API exists.

FIXTURE ONLY: every number it returns is invented for layout work. The head field is the textbook
flat-floor-on-infinite-depth pattern (hyperbolic equipotentials, elliptic flow lines) stretched over the
demo rectangle; it ignores cutoffs, layers and the finite depth, so it is not a solution of the section.
The browser tests never use this server; they run against the real Seepage.Api.

Usage: python3 mock_api.py [port]   (serves ../../../Seepage.Web at / and fake /api/v1 routes)
"""
import cmath, json, math, os, sys
from http.server import SimpleHTTPRequestHandler, ThreadingHTTPServer

ROOT = os.path.abspath(os.path.join(os.path.dirname(__file__), '..', '..', '..'))
WEB = os.path.join(ROOT, 'Seepage.Web')
EXAMPLE = json.load(open(os.path.join(os.path.dirname(__file__), 'fixture.section.json')))
# Optional: a folder of *.section.json files to offer as examples (section preview only; analyses stay fixtures).
EXTRA = os.environ.get('MOCK_EXAMPLES')
EXAMPLES = {'fixture-weir': EXAMPLE}
if EXTRA:
    for f in sorted(os.listdir(EXTRA)):
        if f.endswith('.section.json'):
            EXAMPLES[f[:-len('.section.json')]] = json.load(open(os.path.join(EXTRA, f)))


def fake_field(section):
    up, down = section['heads'][0]['total'], section['heads'][1]['total']
    b = 12.0
    def head(x, y):
        z = complex(x, min(y, -1e-6)) / b
        w = cmath.acosh(z)
        theta = abs(w.imag)
        return down + (up - down) * (theta / math.pi)
    nx, ny = 97, 21
    nodes = [[-80 + 160 * i / (nx - 1), -25 * j / (ny - 1)] for j in range(ny) for i in range(nx)]
    tris = []
    for j in range(ny - 1):
        for i in range(nx - 1):
            a = j * nx + i
            tris += [[a, a + 1, a + nx + 1], [a, a + nx + 1, a + nx]]
    heads = [head(x, y) for x, y in nodes]
    eqs = []
    nd = 9
    for k in range(1, nd):
        theta = math.pi * k / nd
        pts = []
        for s in range(0, 60):
            xi = 3.0 * s / 59
            z = b * cmath.cosh(complex(xi, -theta))
            if z.imag < -25 or abs(z.real) > 80: break
            pts.append([z.real, z.imag])
        eqs.append({'head': down + (up - down) * (1 - k / nd), 'paths': [pts]})
    lines = []
    for k, xi in enumerate([0.05, 0.45, 0.8, 1.1, 1.4]):
        pts = []
        for s in range(0, 81):
            theta = -math.pi + math.pi * s / 80
            z = b * cmath.cosh(complex(xi, theta))
            pts.append([max(-80, min(80, z.real)), max(-25, z.imag)])
        lines.append({'fraction': k / 4, 'points': pts})
    zones = [0 if (nodes[t[0]][1] + nodes[t[1]][1] + nodes[t[2]][1]) / 3 > -9 else 1 for t in tris]
    walls = [[c['top'], c['tip']] for c in section['cutoffs']] + [s['base'] for s in section['structures']]
    return {'id': 'fixture-1', 'nodes': nodes, 'triangles': tris, 'zones': zones, 'heads': heads,
            'equipotentials': eqs, 'flowLines': lines,
            'flowNet': {'flowChannels': 4, 'headDrops': nd, 'shapeFactor': 4 / nd, 'headDifference': up - down},
            'walls': walls}


def fake_result(section):
    g = section.get('waterUnitWeight', 9.81)
    field = fake_field(section)
    stations = []
    for i in range(25):
        x = -12 + i
        h = 1.5 + 4.5 * math.acos(max(-1.0, min(1.0, x / 12))) / math.pi
        stations.append({'x': x, 'y': 0, 'head': h, 'pressure': g * h})
    force = sum(s['pressure'] for s in stations[:-1])
    profile = [{'x': 12 + i * 2, 'gradient': 0.4 / (1 + 0.3 * i)} for i in range(30)]
    return {
        'id': 'fixture-1', 'title': section.get('title', ''), 'createdAt': '2026-12-01T22:00:00Z',
        'flow': {'perMetre': 3.21e-5, 'unit': 'm3/s/m', 'inflow': 3.22e-5, 'outflow': 3.20e-5, 'balance': 0.006,
                 'perMetrePerDay': 3.21e-5 * 86400, 'litresPerMinutePerMetre': 3.21e-5 * 60000,
                 'boundaries': [{'name': 'headwater', 'kind': 'head', 'flow': 3.22e-5}, {'name': 'tailwater', 'kind': 'head', 'flow': -3.20e-5}]},
        'uplift': [{'structure': 'weir floor', 'stations': stations, 'force': force, 'centroidX': -1.7, 'momentAboutDownstreamToe': 9000.0}],
        'exit': {'maxGradient': 0.4, 'at': [12, 0], 'criticalGradient': 1.02, 'factor': 2.55, 'requiredFactor': 3.0, 'pass': False,
                 'depth': 0.5, 'method': 'averaged over depth', 'profile': profile},
        'heave': [{'cutoff': 'downstream pile', 'depth': 6.5, 'averageExcessHead': 1.2, 'factor': 2.8, 'requiredFactor': 1.5, 'pass': True}],
        'creep': {'lane': {'weightedLength': 29.0, 'ratio': 6.4, 'required': 7.0, 'pass': False, 'source': 'fixture'},
                  'bligh': {'weightedLength': 45.0, 'ratio': 10.0, 'required': 15.0, 'pass': False, 'source': 'fixture'}},
        'mesh': {'nodes': len(field['nodes']), 'triangles': len(field['triangles']), 'minAngle': 28.4, 'maxAngle': 118.0, 'minAngleHistogram': [0, 0, 5, 40], 'seconds': 0.05},
        'solver': {'method': 'fixture', 'levels': 0, 'operatorComplexity': 0, 'unknowns': len(field['nodes']), 'iterations': 0, 'residual': 0, 'seconds': 0.0},
        'warnings': ['Fixture data: invented numbers for page layout only.'],
        'caution': 'FIXTURE. Results need review by a licensed geotechnical engineer; local codes govern required factors of safety.',
        'seconds': 0.1}


def problems(section):
    errors = {}
    for i, s in enumerate(section.get('soils', [])):
        if not isinstance(s.get('kx'), (int, float)) or s['kx'] <= 0:
            errors[f'/soils/{i}/kx'] = ['kx must be a positive number.']
    return errors


class Handler(SimpleHTTPRequestHandler):
    def __init__(self, *a, **k):
        super().__init__(*a, directory=WEB, **k)

    def send_json(self, code, body, ctype='application/json'):
        data = json.dumps(body).encode()
        self.send_response(code)
        self.send_header('content-type', ctype)
        self.send_header('content-length', str(len(data)))
        self.end_headers()
        self.wfile.write(data)

    def do_GET(self):
        p = self.path.split('?')[0]
        if p == '/api/v1/examples':
            return self.send_json(200, [{'name': n, 'title': d.get('title', n), 'description': d.get('description', 'Fixture for layout work.'),
                                         'isDefault': n == 'fixture-weir'} for n, d in EXAMPLES.items()])
        if p.startswith('/api/v1/examples/'):
            return self.send_json(200, EXAMPLES[p.rsplit('/', 1)[1]])
        if p.endswith('/field'):
            return self.send_json(200, fake_field(EXAMPLE))
        if p.startswith('/api/v1/analyses/'):
            return self.send_json(200, fake_result(EXAMPLE))
        return super().do_GET()

    def do_POST(self):
        body = self.rfile.read(int(self.headers.get('content-length', 0)))
        try:
            section = json.loads(body)
        except ValueError:
            return self.send_json(400, {'title': 'Invalid JSON', 'status': 400, 'errors': {'': ['not JSON']}}, 'application/problem+json')
        errors = problems(section)
        if errors:
            return self.send_json(400, {'title': 'The section has problems', 'status': 400, 'errors': errors}, 'application/problem+json')
        if self.path.startswith('/api/v1/sections/validate'):
            return self.send_json(200, {'valid': True, 'warnings': []})
        return self.send_json(201, fake_result(section))


if __name__ == '__main__':
    port = int(sys.argv[1]) if len(sys.argv) > 1 else 8765
    ThreadingHTTPServer(('127.0.0.1', port), Handler).serve_forever()
