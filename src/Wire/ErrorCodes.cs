namespace Bramble.Wire;

/// <summary>
/// The codes of <c>err &lt;code&gt; &lt;text&gt;</c>. The first five are the protocol's own (docs/protocol.md); the rest are
/// this engine's, documented in docs/protocol.md. A harness should treat any code it does not know
/// as a plain failure of that request.
/// </summary>
public static class ErrorCodes
{
    /// <summary>The first word is not a twine/1 request.</summary>
    public const string UnknownRequest = "unknown-request";

    /// <summary>A known request with the wrong shape: missing or extra tokens, a bad number, bad bytes, an overlong line.</summary>
    public const string BadRequest = "bad-request";

    /// <summary><c>set</c> named a setting the engine does not have.</summary>
    public const string UnknownSetting = "unknown-setting";

    /// <summary><c>begin</c> named an unknown ruleset or a position that does not parse.</summary>
    public const string BadPosition = "bad-position";

    /// <summary><c>apply</c> named a move that does not parse or is not legal for that side.</summary>
    public const string BadMove = "bad-move";

    /// <summary>A well-formed request at the wrong time: before <c>hello</c>, or <c>think</c>/<c>apply</c>/<c>assess</c> before <c>begin</c>.</summary>
    public const string OutOfOrder = "out-of-order";

    /// <summary><c>assess</c> could not reach an exact value within its budget.</summary>
    public const string NoValue = "no-value";

    /// <summary>A harness-side code: an engine's line that is not a well-formed twine/1 reply (the journal's <c>end</c> uses the same word).</summary>
    public const string BadReply = "bad-reply";

    /// <summary>The engine itself failed while serving a well-formed request (a bug); it keeps serving.</summary>
    public const string Failed = "failed";
}
