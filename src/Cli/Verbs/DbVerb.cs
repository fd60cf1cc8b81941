using System.CommandLine;
using System.Diagnostics;
using Bramble.Rules;
using Bramble.Rules.Database;
using Bramble.Values;
using Serilog;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble db build &lt;ruleset&gt; --cells N --out FILE</c> and <c>bramble db info FILE</c>:
/// precompute a component-value database, and say what one holds (docs/database.md).
/// </summary>
public static class DbVerb
{
    public static Command Build()
    {
        var command = new Command("db", "Component-value databases: precompute one, or show what one holds");
        command.Subcommands.Add(BuildCommand());
        command.Subcommands.Add(InfoCommand());
        return command;
    }

    private static Command BuildCommand()
    {
        var ruleset = new Argument<string>("ruleset") { Description = "the ruleset: " + ComponentCatalogues.Describe() };
        var cells = new Option<int?>("--cells") { Description = "Largest component to precompute, in the ruleset's unit (listed under <ruleset>)", HelpName = "N" };
        // Another spelling, kept working for scripts but not shown.
        var size = new Option<int?>("--size") { Description = "Same as --cells", Hidden = true };
        var output = new Option<FileInfo>("--out") { Description = "Database file to write (merged with it when it already is one)", Required = true, HelpName = "FILE" };
        var command = new Command("build", "Precompute the values of every component up to size N (cells, squares or stones: the ruleset's unit)") { ruleset, cells, size, output };
        command.SetAction(parse => Failures.Guard(() =>
        {
            int n = parse.GetValue(cells) ?? parse.GetValue(size) ?? throw new InputException("db build: --cells N is required (the largest component, in the ruleset's unit: " + ComponentCatalogues.Describe() + ")");
            return RunBuild(parse.GetValue(ruleset)!, n, parse.GetValue(output)!);
        }));
        return command;
    }

    private static Command InfoCommand()
    {
        var file = new Argument<FileInfo>("file") { Description = "A database file" };
        var command = new Command("info", "Say what a database file holds") { file };
        command.SetAction(parse => Failures.Guard(() => RunInfo(parse.GetValue(file)!)));
        return command;
    }

    private static int RunBuild(string rulesetName, int size, FileInfo output)
    {
        var ruleset = Rulesets.Find(rulesetName);
        if (ruleset is null)
        {
            Console.Error.WriteLine($"error: unknown ruleset '{rulesetName}'; known: {string.Join(", ", Rulesets.All.Select(r => r.Name))}");
            return Entry.BadInput;
        }
        if (ruleset is not IComponentCatalogue catalogue)
        {
            Console.Error.WriteLine($"error: ruleset '{ruleset.Name}' has no list of components to precompute (its components are not drawn from a finite set)");
            return Entry.BadInput;
        }
        if (size < 1 || size > catalogue.MaxCatalogueSize)
        {
            Console.Error.WriteLine($"error: --cells must be between 1 and {catalogue.MaxCatalogueSize} for {ruleset.Name}, not {size}");
            return Entry.BadInput;
        }

        var context = new ValueContext();
        int earlier;
        try
        {
            // Check an existing file before the long computation, not after it.
            earlier = ComponentDatabase.Load(output.FullName, context);
        }
        catch (DatabaseFormatException e)
        {
            Console.Error.WriteLine($"error: {e.Message}; refusing to overwrite it (move it away or choose another --out)");
            return Entry.BadInput;
        }

        var clock = Stopwatch.StartNew();
        int components = BigStack.Run(() =>
        {
            int n = 0, lastSize = 0;
            foreach (var component in catalogue.ComponentsUpTo(size))
            {
                if (component.Size != lastSize)
                {
                    Log.Information("db build {Ruleset}: {Unit} {Size}, {Done} components so far, {Ms} ms", ruleset.Name, catalogue.SizeUnit, component.Size, n, clock.ElapsedMilliseconds);
                    lastSize = component.Size;
                }
                ruleset.Value(component, context);
                n++;
            }
            return n;
        });
        double seconds = clock.Elapsed.TotalSeconds;

        string description = $"bramble db build {ruleset.Name} --cells {size}" + (earlier > 0 ? $" (added to {earlier} earlier entries)" : "");
        try
        {
            ComponentDatabase.Save(output.FullName, context, description);
        }
        catch (DatabaseFormatException e)
        {
            Console.Error.WriteLine($"error: {e.Message}");
            return Entry.BadInput;
        }
        catch (IOException e)
        {
            Console.Error.WriteLine($"error: could not write {output.FullName}: {e.Message}");
            return Entry.JobFailed;
        }
        catch (UnauthorizedAccessException e)
        {
            Console.Error.WriteLine($"error: could not write {output.FullName}: {e.Message}");
            return Entry.JobFailed;
        }
        long bytes = new FileInfo(output.FullName).Length;
        Console.WriteLine($"{output.Name}: {components:N0} {ruleset.Name} components of up to {size} {catalogue.SizeUnit} valued in {seconds:F1} s; " +
                          $"{context.Memo.Count:N0} entries, {bytes:N0} bytes");
        return Entry.Success;
    }

    private static int RunInfo(FileInfo file)
    {
        if (!file.Exists)
        {
            Console.Error.WriteLine($"error: {file.FullName}: no such file");
            return Entry.BadInput;
        }
        DatabaseSummary summary;
        try
        {
            summary = DatabaseSummary.Of(file.FullName);
        }
        catch (DatabaseFormatException e)
        {
            Console.Error.WriteLine($"error: {e.Message}");
            return Entry.BadInput;
        }
        Console.WriteLine($"{file.Name}: Bramble component database, format version {summary.Version}");
        if (summary.Description.Length > 0) Console.WriteLine($"  made by:  {summary.Description}");
        Console.WriteLine($"  contents: {summary.Entries:N0} entries, {summary.GameNodes:N0} game nodes, {summary.FileBytes:N0} bytes");
        foreach (var part in summary.Rulesets)
        {
            Console.WriteLine($"  {part.Ruleset}: {part.Entries:N0} components, {part.DistinctValues:N0} distinct values " +
                              $"({part.Numbers:N0} numbers, {part.Nimbers:N0} nimbers, {part.OtherValues:N0} others)");
            if (part.EntriesBySize.Count > 0)
                Console.WriteLine($"    by {part.SizeUnit}: " + string.Join(", ", part.EntriesBySize.Select(kv => $"{kv.Key}: {kv.Value:N0}")));
        }
        return Entry.Success;
    }
}
