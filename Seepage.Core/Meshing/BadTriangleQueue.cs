namespace Seepage.Core.Meshing;

/// <summary>Triangles waiting for refinement, taken last-in first-out: the refinement then works through
/// one neighbourhood before moving on, which keeps the working arrays in cache. An entry remembers the
/// triangle's vertices, so an entry whose slot was reused by another triangle is recognised and dropped.</summary>
internal sealed class BadTriangleQueue
{
    private int[] _items = new int[1024]; // 4 ints per entry: slot, a, b, c
    private int _count;

    public void Add(Triangulation tri, int t)
    {
        if (_count + 4 > _items.Length) Array.Resize(ref _items, _items.Length * 2);
        _items[_count] = t;
        _items[_count + 1] = tri.V[3 * t];
        _items[_count + 2] = tri.V[3 * t + 1];
        _items[_count + 3] = tri.V[3 * t + 2];
        _count += 4;
    }

    public bool TryTake(Triangulation tri, out int t)
    {
        while (_count > 0)
        {
            _count -= 4;
            t = _items[_count];
            if (tri.V[3 * t] == _items[_count + 1] && tri.V[3 * t + 1] == _items[_count + 2] && tri.V[3 * t + 2] == _items[_count + 3])
                return true;
        }
        t = -1;
        return false;
    }
}
