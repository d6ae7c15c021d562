namespace Seepage.Api.Storage;

/// <summary>Signed integers as zigzag LEB128 varints (small magnitudes take one byte), written to and read from a buffer.</summary>
public sealed class VarintWriter
{
    private readonly MemoryStream _bytes = new();

    public void Write(long value)
    {
        ulong v = (ulong)((value << 1) ^ (value >> 63));
        while (v >= 0x80) { _bytes.WriteByte((byte)(v | 0x80)); v >>= 7; }
        _bytes.WriteByte((byte)v);
    }

    public void WriteDouble(double value) => Write(BitConverter.DoubleToInt64Bits(value));

    public void WriteBytes(ReadOnlySpan<byte> bytes)
    {
        Write(bytes.Length);
        _bytes.Write(bytes);
    }

    public void CopyTo(Stream target) => _bytes.WriteTo(target);
}

/// <summary>Reads what <see cref="VarintWriter"/> wrote; damaged data throws <see cref="InvalidDataException"/>.</summary>
public sealed class VarintReader(ReadOnlyMemory<byte> data)
{
    private int _at;

    public long Read()
    {
        ulong v = 0;
        for (int shift = 0; shift < 70; shift += 7)
        {
            if (_at >= data.Length) throw new InvalidDataException("Stored field data is truncated.");
            byte b = data.Span[_at++];
            v |= (ulong)(b & 0x7F) << shift;
            if (b < 0x80) return (long)(v >> 1) ^ -(long)(v & 1);
        }
        throw new InvalidDataException("Stored field data has a malformed number.");
    }

    public int ReadCount(int max)
    {
        long n = Read();
        if (n < 0 || n > max) throw new InvalidDataException("Stored field data has an impossible length.");
        return (int)n;
    }

    public double ReadDouble() => BitConverter.Int64BitsToDouble(Read());

    public ReadOnlyMemory<byte> ReadBytes()
    {
        int n = ReadCount(data.Length - _at);
        var block = data.Slice(_at, n);
        _at += n;
        return block;
    }
}
