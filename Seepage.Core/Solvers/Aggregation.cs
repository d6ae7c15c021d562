namespace Seepage.Core.Solvers;

/// <summary>Greedy aggregation on the graph of strong connections, the three passes of Vaněk, Mandel and
/// Brezina, "Algebraic multigrid by smoothed aggregation for second and fourth order elliptic problems",
/// Computing 56 (1996) 179–196 (recalled from memory):
/// (1) every node whose strong neighbourhood is still free becomes the root of an aggregate made of that
/// neighbourhood; (2) each node left over joins the aggregate it is most strongly connected to;
/// (3) nodes still left over group with their free strong neighbours.
/// j is a strong neighbour of i when |a_ij| ≥ θ √(|a_ii a_jj|) (symmetric strength). A node with no strong
/// neighbour at all stays out of every aggregate (−1): its error is left to the smoother.</summary>
internal static class Aggregation
{
    /// <summary>Aggregate index of every row (−1 for isolated rows) and the number of aggregates.</summary>
    public static (int[] Aggregate, int Count) Build(CsrMatrix a, double[] diagonal, double theta)
    {
        int n = a.Size;
        var rs = a.RowStart; var cols = a.Columns; var vals = a.Values;
        // Strong-connection mask per nonzero, computed once (a parallel pass; it is read three times below).
        var strong = new bool[a.NonZeros];
        double theta2 = theta * theta;
        TwoWay.For(n, a.SplitRow, (lo, hi) =>
        {
            for (int i = lo; i < hi; i++)
                for (int k = rs[i]; k < rs[i + 1]; k++)
                {
                    int j = cols[k];
                    strong[k] = j != i && vals[k] * vals[k] >= theta2 * Math.Abs(diagonal[i] * diagonal[j]) && vals[k] != 0;
                }
        });

        var aggregate = new int[n]; Array.Fill(aggregate, -2);   // −2 free, −1 isolated
        int count = 0;
        for (int i = 0; i < n; i++)
        {
            bool any = false;
            for (int k = rs[i]; k < rs[i + 1]; k++) if (strong[k]) { any = true; break; }
            if (!any) aggregate[i] = -1;
        }

        // Pass 1: roots with an entirely free strong neighbourhood.
        for (int i = 0; i < n; i++)
        {
            if (aggregate[i] != -2) continue;
            bool free = true;
            for (int k = rs[i]; k < rs[i + 1]; k++)
                if (strong[k] && aggregate[cols[k]] != -2) { free = false; break; }
            if (!free) continue;
            aggregate[i] = count;
            for (int k = rs[i]; k < rs[i + 1]; k++) if (strong[k]) aggregate[cols[k]] = count;
            count++;
        }

        // Pass 2: join the most strongly connected aggregate of pass 1 (recorded first, assigned after, so
        // the outcome does not depend on the order within the pass).
        var join = new int[n];
        for (int i = 0; i < n; i++)
        {
            join[i] = -2;
            if (aggregate[i] != -2) continue;
            double best = 0;
            for (int k = rs[i]; k < rs[i + 1]; k++)
            {
                if (!strong[k]) continue;
                int g = aggregate[cols[k]];
                if (g >= 0 && Math.Abs(vals[k]) > best) { best = Math.Abs(vals[k]); join[i] = g; }
            }
        }
        for (int i = 0; i < n; i++) if (join[i] >= 0) aggregate[i] = join[i];

        // Pass 3: what is left groups with its free strong neighbours.
        for (int i = 0; i < n; i++)
        {
            if (aggregate[i] != -2) continue;
            aggregate[i] = count;
            for (int k = rs[i]; k < rs[i + 1]; k++)
                if (strong[k] && aggregate[cols[k]] == -2) aggregate[cols[k]] = count;
            count++;
        }
        return (aggregate, count);
    }
}
