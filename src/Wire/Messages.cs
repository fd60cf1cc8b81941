using Bramble.Values;

namespace Bramble.Wire;

// The twine/1 messages of docs/protocol.md as records. Moves and positions stay text here: the codec
// knows no ruleset, so a move is checked by the engine that holds the position, not by the parser.
// Every record turns back into its line with Codec.Format.

/// <summary>One twine/1 line, in either direction.</summary>
public abstract record Message;

/// <summary>A line the harness sends to the engine.</summary>
public abstract record Request : Message;

/// <summary>A line the engine sends to the harness.</summary>
public abstract record Reply : Message;

/// <summary><c>hello twine &lt;version&gt;</c>: the handshake; must come first.</summary>
public sealed record HelloRequest(int Version) : Request
{
    /// <summary>The protocol version this code speaks.</summary>
    public const int CurrentVersion = 1;
}

/// <summary><c>set &lt;name&gt; &lt;value&gt;</c>: an engine setting; the value is the rest of the line.</summary>
public sealed record SetRequest(string Name, string Value) : Request;

/// <summary><c>begin &lt;ruleset&gt; &lt;position&gt;</c>: a new game; the position is the rest of the line, spaces included.</summary>
public sealed record BeginRequest(string Ruleset, string Position) : Request;

/// <summary><c>apply &lt;side&gt; &lt;move&gt;</c>: a move has been made (the engine's own moves too).</summary>
public sealed record ApplyRequest(Side Side, string Move) : Request;

/// <summary>
/// <c>think &lt;side&gt; clock=&lt;ms&gt; inc=&lt;ms&gt;</c>: choose a move for that side. A missing
/// <c>clock=</c> or <c>inc=</c> is null: the engine then falls back on its own budget setting.
/// </summary>
public sealed record ThinkRequest(Side Side, long? ClockMs, long? IncMs) : Request;

/// <summary><c>halt</c>: the pending <c>think</c> answers at once.</summary>
public sealed record HaltRequest : Request;

/// <summary><c>assess</c>: the engine's view of the current position.</summary>
public sealed record AssessRequest : Request;

/// <summary><c>bye</c>: the engine answers <c>bye</c> and exits with status 0.</summary>
public sealed record ByeRequest : Request;

/// <summary><c>welcome name=&lt;id&gt; version=&lt;v&gt; rulesets=&lt;a,b,…&gt;</c>.</summary>
public sealed record WelcomeReply(string Name, string Version, IReadOnlyList<string> Rulesets) : Reply
{
    public bool Equals(WelcomeReply? other) =>
        other is not null && Name == other.Name && Version == other.Version && Rulesets.SequenceEqual(other.Rulesets);

    public override int GetHashCode() => HashCode.Combine(Name, Version, Rulesets.Count);
}

/// <summary><c>ok</c>, or <c>ok components=&lt;n&gt;</c> after <c>begin</c>.</summary>
public sealed record OkReply(int? Components = null) : Reply;

/// <summary><c>err &lt;code&gt; &lt;text&gt;</c>: a request failed; <see cref="ErrorCodes"/> lists the codes.</summary>
public sealed record ErrReply(string Code, string Text) : Reply
{
    public ErrReply(WireError error) : this(error.Code, error.Text) { }
}

/// <summary>
/// <c>note key=value …</c>: progress while thinking (<c>nodes=</c>, <c>ms=</c>, <c>value=</c>,
/// <c>line=</c>). Values hold no spaces: a value notation is written without them
/// (<c>value=1/2+↑*</c>) and a line of moves is comma-separated (<c>line=e3,e7</c>).
/// </summary>
public sealed record NoteReply(IReadOnlyList<KeyValuePair<string, string>> Fields) : Reply
{
    public string? this[string key] => Fields.FirstOrDefault(f => f.Key == key).Value;

    public bool Equals(NoteReply? other) => other is not null && Fields.SequenceEqual(other.Fields);

    public override int GetHashCode() => Fields.Count;
}

/// <summary><c>pick &lt;move&gt;</c>, or <c>pick none</c> (null) when the side has no legal move.</summary>
public sealed record PickReply(string? Move) : Reply
{
    public const string NoMove = "none";
}

/// <summary>
/// <c>value &lt;value&gt; outcome=&lt;L/R/N/P&gt;</c>. The value may hold spaces (<c>1/2 + ↑*</c>);
/// it runs up to the first <c>key=value</c> token, which is safe because value notation has no <c>=</c>.
/// </summary>
public sealed record ValueReply(string Value, Outcome Outcome) : Reply;

/// <summary><c>bye</c>: the engine's last line.</summary>
public sealed record ByeReply : Reply;

/// <summary>Why a line could not be read or understood: a code from <see cref="ErrorCodes"/> and a text for people.</summary>
public sealed record WireError(string Code, string Text);
