namespace Bramble.Web.Api;

/// <summary>
/// The body of every 4xx/5xx answer. <c>Column</c> is 1-based and set for bad notation, with the
/// text and what was expected there, so the page can put a caret under the fault.
/// </summary>
public sealed record ErrorReply(string Error, string? Path = null, int? Column = null, string? Text = null, string? Expected = null);
