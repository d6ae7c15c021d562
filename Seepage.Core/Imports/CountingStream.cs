namespace Seepage.Core.Imports;

/// <summary>A read-only stream over another that counts the bytes read and throws <see cref="LimitExceededException"/> once
/// they pass a limit, so a zip part cannot unpack to more than it is allowed whatever its header says.</summary>
internal sealed class CountingStream(Stream inner, long limit) : Stream
{
    public sealed class LimitExceededException() : IOException("The unpacked size limit was exceeded.");

    public long Count { get; private set; }

    public override int Read(byte[] buffer, int offset, int count)
    {
        int read = inner.Read(buffer, offset, (int)Math.Min(count, Math.Max(1, limit - Count + 1)));
        Count += read;
        if (Count > limit) throw new LimitExceededException();
        return read;
    }

    public override bool CanRead => true;
    public override bool CanSeek => false;
    public override bool CanWrite => false;
    public override long Length => throw new NotSupportedException();
    public override long Position { get => Count; set => throw new NotSupportedException(); }
    public override void Flush() { }
    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
    public override void SetLength(long value) => throw new NotSupportedException();
    public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();

    protected override void Dispose(bool disposing)
    {
        if (disposing) inner.Dispose();
        base.Dispose(disposing);
    }
}
