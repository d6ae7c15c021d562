namespace Seepage.Core.Meshing;

/// <summary>Queue of triangles waiting for refinement. An entry remembers the triangle's vertices, so an
/// entry whose slot was reused by another triangle is recognised and dropped.</summary>
internal sealed class BadTriangleQueue
{
    private int[] _items = new int[1024]; // 4 ints per entry: slot, a, b, c
    private int _head, _tail;

    public void Add(Triangulation tri, int t)
    {
        if (_tail + 4 > _items.Length)
        {
            int live = _tail - _head;
            if (_head >= _items.Length / 2) Array.Copy(_items, _head, _items, 0, live);
            else
            {
                var grown = new int[_items.Length * 2];
                Array.Copy(_items, _head, grown, 0, live);
                _items = grown;
            }
            _head = 0; _tail = live;
        }
        _items[_tail] = t;
        _items[_tail + 1] = tri.V[3 * t];
        _items[_tail + 2] = tri.V[3 * t + 1];
        _items[_tail + 3] = tri.V[3 * t + 2];
        _tail += 4;
    }

    public bool TryTake(Triangulation tri, out int t)
    {
        while (_head < _tail)
        {
            t = _items[_head];
            bool same = tri.V[3 * t] == _items[_head + 1] && tri.V[3 * t + 1] == _items[_head + 2] && tri.V[3 * t + 2] == _items[_head + 3];
            _head += 4;
            if (same) return true;
        }
        t = -1;
        return false;
    }
}
