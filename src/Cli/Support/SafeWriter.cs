using System.Text;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// The console writers Bramble prints through: everything written is passed through
/// <see cref="PrintableText.Escape"/> (control and bidirectional characters become visible escapes, docs/cli.md). <see cref="Entry"/> installs one on stdout and one on
/// stderr, so no verb, message or log line can send a control character to the terminal.
/// </summary>
public sealed class SafeWriter(TextWriter inner) : TextWriter
{
    public TextWriter Inner => inner;

    public override Encoding Encoding => inner.Encoding;

    public override IFormatProvider FormatProvider => inner.FormatProvider;

    public override string NewLine
    {
        get => inner.NewLine;
#pragma warning disable CS8765 // the base allows null (meaning the default); the inner writer does the same
        set => inner.NewLine = value;
#pragma warning restore CS8765
    }

    public override void Write(char value)
    {
        if (PrintableText.NeedsEscape(value)) inner.Write(PrintableText.Escape(value.ToString()));
        else inner.Write(value);
    }

    public override void Write(string? value)
    {
        if (value is not null) inner.Write(PrintableText.Escape(value));
    }

    public override void Write(char[] buffer, int index, int count) => Write(new string(buffer, index, count));

    public override void WriteLine() => inner.WriteLine();

    public override void WriteLine(string? value)
    {
        Write(value);
        inner.WriteLine();
    }

    /// <summary>A carriage return of Bramble's own (the match progress line rewrites itself in place).</summary>
    public void ReturnToLineStart() => inner.Write('\r');

    public override void Flush() => inner.Flush();

    /// <summary>Writes a carriage return on <paramref name="writer"/>, past the escaping when it is a <see cref="SafeWriter"/>.</summary>
    public static void CarriageReturn(TextWriter writer)
    {
        if (writer is SafeWriter safe) safe.ReturnToLineStart();
        else writer.Write('\r');
    }
}
