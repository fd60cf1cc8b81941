using System.CommandLine;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Wire;
using Serilog;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble engine [--strategy S] [--budget-ms N] [--seed X] [--nodes N] [--db FILE] [--log FILE]</c>: serves
/// twine/1 on stdin/stdout until <c>bye</c> or end of input. Stdout carries only the protocol;
/// logs go to stderr or the <c>--log</c> file.
/// </summary>
public static class EngineVerb
{
    public static Command Build()
    {
        var strategy = new Option<string?>("--strategy") { Description = $"Player to serve: {string.Join(", ", Players.Names)} (default: the strongest available)", HelpName = "S" };
        // Numbers are read as text and checked here; unknown words are reported by Entry on
        // stderr (never on stdout, which belongs to the protocol in this verb).
        var budget = new Option<string?>("--budget-ms") { Description = $"Thinking budget per move when think gives no clock, and the cap when it does (default {EngineSettings.DefaultBudgetMs})", HelpName = "N" };
        var seed = new Option<string?>("--seed") { Description = "Seed for players that use chance (default 1)", HelpName = "X" };
        var nodes = new Option<string?>("--nodes") { Description = "Limit each move by work, at most N nodes, rather than by time: the same game gives the same moves on any machine (see docs/matches.md)", HelpName = "N" };
        var command = new Command("engine", "Serve the twine/1 protocol on stdin and stdout (see docs/protocol.md)") { strategy, budget, seed, nodes };
        command.Options.Add(DbOption.Option);
        command.SetAction(parse => Failures.Guard(() =>
        {
            var settings = Settings(parse.GetValue(strategy), parse.GetValue(budget), parse.GetValue(seed), parse.GetValue(nodes));
            var db = parse.GetValue(DbOption.Option);
            // Check the database before serving, so a bad file is a bad-input exit rather than a broken session.
            DbOption.Load(db, new ValueContext());
            var setup = new EngineSetup
            {
                Version = EngineSetup.VersionOf(typeof(EngineVerb).Assembly),
                Settings = settings,
                CreatePlayer = (name, seed, nodes) =>
                {
                    var player = Players.Create(name, seed, nodes);
                    // The perfect player keeps its own value context; the database serves it too.
                    if (player is PerfectPlayer perfect) DbOption.Load(db, perfect.Context);
                    return player;
                },
                CreateValueContext = () =>
                {
                    var context = new ValueContext();
                    DbOption.Load(db, context);
                    return context;
                },
                Log = Log.Logger,
                // End of input while thinking (the harness died, even by kill -9) ends the engine within seconds.
                ForceExit = Environment.Exit,
            };
            using var stdin = Console.OpenStandardInput();
            using var stdout = Console.OpenStandardOutput();
            return new EngineHost(setup).Serve(stdin, stdout);
        }));
        return command;
    }

    private static EngineSettings Settings(string? strategy, string? budgetText, string? seedText, string? nodesText)
    {
        var settings = EngineSettings.Default(Players.Names);
        if (nodesText is not null)
        {
            var (limited, error) = settings.With("nodes", nodesText, Players.Names);
            settings = limited ?? throw new InputException($"--nodes: {error!.Text}");
        }
        if (seedText is not null)
        {
            if (!int.TryParse(seedText, System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out var seed))
                throw new InputException($"--seed: needs a whole number, got '{seedText}'");
            settings = settings with { Seed = seed };
        }
        if (strategy is not null)
        {
            var known = Players.Names.FirstOrDefault(n => string.Equals(n, strategy, StringComparison.OrdinalIgnoreCase))
                ?? throw new InputException($"--strategy: unknown strategy '{strategy}'; known: {string.Join(", ", Players.Names)}");
            settings = settings with { Strategy = known };
        }
        if (budgetText is null) return settings;
        if (!long.TryParse(budgetText, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var budgetMs)
            || budgetMs is < 1 or > EngineSettings.MostMs)
            throw new InputException($"--budget-ms: needs whole milliseconds from 1 to {EngineSettings.MostMs}, got '{budgetText}'");
        return settings with { BudgetMs = budgetMs };
    }
}
