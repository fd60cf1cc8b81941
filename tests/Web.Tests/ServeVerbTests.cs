using Bramble.Cli;

namespace Bramble.Web.Tests;

/// <summary><c>bramble serve</c> refuses bad options with exit status 2 before listening.</summary>
public sealed class ServeVerbTests
{
    [Fact]
    public void ListenTakesAnAddress() => Assert.Equal(Entry.BadInput, Entry.Run(["serve", "--listen", "the-orchard", "--port", "0"]));

    [Fact]
    public void PortMustFit() => Assert.Equal(Entry.BadInput, Entry.Run(["serve", "--port", "70000"]));

    [Fact]
    public void EnginesFileMustBeReadable() =>
        Assert.Equal(Entry.BadInput, Entry.Run(["serve", "--port", "0", "--engines", Path.Combine(Path.GetTempPath(), "no-such-engines-file.json")]));
}
