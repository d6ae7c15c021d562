using System.IO.Compression;
using System.Text;

namespace Seepage.Api.Storage;

/// <summary>Text stored Brotli-compressed (a result document of tens of kB takes a few).</summary>
public static class TextCodec
{
    public static byte[] Pack(string text)
    {
        using var packed = new MemoryStream();
        using (var brotli = new BrotliStream(packed, CompressionLevel.Optimal, leaveOpen: true)) brotli.Write(Encoding.UTF8.GetBytes(text));
        return packed.ToArray();
    }

    public static string Unpack(byte[] packed)
    {
        using var brotli = new BrotliStream(new MemoryStream(packed), CompressionMode.Decompress);
        using var reader = new StreamReader(brotli, Encoding.UTF8);
        return reader.ReadToEnd();
    }
}
