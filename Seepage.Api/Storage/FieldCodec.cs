using System.IO.Compression;
using System.Text.Json;
using Seepage.Api.Contracts;

namespace Seepage.Api.Storage;

/// <summary>The stored form of field data (about a tenth of its JSON): node coordinates and heads as decimals in fixed
/// point, triangles as index differences, gradients and velocities as residuals from <see cref="FieldPredictors"/>, the
/// rest (lines, counts, soil names) as JSON; all Brotli-compressed. Every double comes back bit for bit, so the field
/// JSON served is the same as the one computed.</summary>
public static class FieldCodec
{
    private static ReadOnlySpan<byte> Magic => "SPF2"u8;
    private const int MaxItems = 100_000_000;

    // Brotli quality 6 with a 16 MB window: on the design example 197 kB in about 75 ms; quality 9 saves under 1 kB at
    // six times the time, 10 saves 18 kB at twenty times (measured by FieldCodecTests).
    private const int Quality = 6, Window = 24;

    public static byte[] Encode(FieldDto field)
    {
        var xy = Flatten(field.Nodes, 2);
        var triangles = Flatten(field.Triangles, 3);
        var gradients = Flatten(field.Gradients, 2);
        var velocities = Flatten(field.Velocities, 2);
        int zoneCount = field.Zones.Length == 0 ? 0 : field.Zones.Max() + 1;
        if (field.Zones.Length != field.Triangles.Length || field.Gradients.Length != field.Triangles.Length
            || field.Velocities.Length != field.Triangles.Length || field.Zones.Any(z => z < 0))
            throw new ArgumentException("Field data has per-triangle arrays of different lengths.", nameof(field));
        var w = new VarintWriter();
        var rest = field with { Nodes = [], Triangles = [], Zones = [], Heads = [], Gradients = [], Velocities = [], Equipotentials = [], FlowLines = [] };
        w.WriteBytes(JsonSerializer.SerializeToUtf8Bytes(rest, AnalysisService.Json));
        FieldLines.Write(w, field.Equipotentials, field.FlowLines);
        DecimalColumn.WriteSmooth(w, field.Nodes.Select(n => n[0]).ToArray());      // x and y apart: each varies smoothly
        DecimalColumn.WriteSmooth(w, field.Nodes.Select(n => n[1]).ToArray());
        DecimalColumn.WriteSmooth(w, field.Heads);
        w.Write(field.Triangles.Length);
        for (int t = 0; t < field.Triangles.Length; t++) w.Write(triangles[3 * t] - (t == 0 ? 0 : triangles[3 * t - 3]));
        for (int k = 1; k < 3; k++)
            for (int t = 0; t < field.Triangles.Length; t++) w.Write(triangles[3 * t + k] - triangles[3 * t]);
        foreach (int z in field.Zones) w.Write(z);
        var guess = new double[gradients.Length];
        for (int t = 0; t < field.Triangles.Length; t++)
            (guess[2 * t], guess[2 * t + 1]) = FieldPredictors.PlaneGradient(xy, field.Heads, triangles, t);
        DecimalColumn.WritePredicted(w, gradients, guess);
        var maps = FieldPredictors.FitLinearMaps(gradients, velocities, field.Zones, zoneCount);
        w.Write(maps.Length);
        foreach (double m in maps) w.WriteDouble(m);
        for (int i = 0; i < velocities.Length; i++) guess[i] = FieldPredictors.Mapped(maps, gradients, field.Zones, i / 2, i % 2);
        DecimalColumn.WritePredicted(w, velocities, guess);

        using var raw = new MemoryStream();
        w.CopyTo(raw);
        var input = raw.GetBuffer().AsSpan(0, (int)raw.Length);
        var packed = new byte[Magic.Length + BrotliEncoder.GetMaxCompressedLength(input.Length)];
        Magic.CopyTo(packed);
        using var encoder = new BrotliEncoder(Quality, Window);
        var status = encoder.Compress(input, packed.AsSpan(Magic.Length), out _, out int written, isFinalBlock: true);
        if (status != System.Buffers.OperationStatus.Done) throw new InvalidOperationException($"Field data compression ended {status}.");
        return packed[..(Magic.Length + written)];
    }

    public static FieldDto Decode(byte[] stored)
    {
        if (stored.Length < Magic.Length || !stored.AsSpan(0, Magic.Length).SequenceEqual(Magic))
            throw new InvalidDataException("Stored field data has an unknown format.");
        using var raw = new MemoryStream();
        using (var brotli = new BrotliStream(new MemoryStream(stored, Magic.Length, stored.Length - Magic.Length), CompressionMode.Decompress))
            brotli.CopyTo(raw);
        var r = new VarintReader(raw.GetBuffer().AsMemory(0, (int)raw.Length));
        var rest = JsonSerializer.Deserialize<FieldDto>(r.ReadBytes().Span, AnalysisService.Json)
            ?? throw new InvalidDataException("Stored field data lacks its JSON part.");
        var (equipotentials, flowLines) = FieldLines.Read(r, MaxItems);
        var x = DecimalColumn.ReadSmooth(r, MaxItems);
        var y = DecimalColumn.ReadSmooth(r, MaxItems);
        if (x.Length != y.Length) throw new InvalidDataException("Stored field data has unequal coordinate columns.");
        var xy = new double[2 * x.Length];
        for (int i = 0; i < x.Length; i++) (xy[2 * i], xy[2 * i + 1]) = (x[i], y[i]);
        var heads = DecimalColumn.ReadSmooth(r, MaxItems);
        int count = r.ReadCount(MaxItems);
        var triangles = new int[3 * count];
        var zones = new int[count];
        for (int t = 0; t < count; t++) triangles[3 * t] = (t == 0 ? 0 : triangles[3 * t - 3]) + (int)r.Read();
        for (int k = 1; k < 3; k++)
            for (int t = 0; t < count; t++) triangles[3 * t + k] = triangles[3 * t] + (int)r.Read();
        for (int t = 0; t < count; t++) zones[t] = (int)r.Read();
        var gradients = new double[2 * count];
        DecimalColumn.ReadPredicted(r, i => Component(FieldPredictors.PlaneGradient(xy, heads, triangles, i / 2), i % 2), 2 * count, gradients);
        var maps = new double[r.ReadCount(MaxItems)];
        for (int i = 0; i < maps.Length; i++) maps[i] = r.ReadDouble();
        var velocities = DecimalColumn.ReadPredicted(r, i => FieldPredictors.Mapped(maps, gradients, zones, i / 2, i % 2), 2 * count);
        return rest with
        {
            Equipotentials = equipotentials, FlowLines = flowLines, Nodes = Split(xy, 2), Triangles = Split(triangles, 3), Zones = zones, Heads = heads,
            Gradients = Split(gradients, 2), Velocities = Split(velocities, 2),
        };
    }

    private static double Component((double X, double Y) v, int k) => k == 0 ? v.X : v.Y;

    private static T[] Flatten<T>(T[][] rows, int width)
    {
        var flat = new T[rows.Length * width];
        for (int i = 0; i < rows.Length; i++)
        {
            if (rows[i].Length != width) throw new ArgumentException($"Field rows must have {width} entries.", nameof(rows));
            rows[i].CopyTo(flat, i * width);
        }
        return flat;
    }

    private static T[][] Split<T>(T[] flat, int width)
    {
        var rows = new T[flat.Length / width][];
        for (int i = 0; i < rows.Length; i++) rows[i] = flat.AsSpan(i * width, width).ToArray();
        return rows;
    }
}
