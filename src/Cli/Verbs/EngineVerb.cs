using System.CommandLine;
using Bramble.Rules;
using Bramble.Search;
using Bramble.Wire;
using Serilog;

namespace Bramble.Cli;

/// <summary>
/// <c>bramble engine [--strategy S] [--budget-ms N] [--seed X] [--db FILE] [--log FILE]</c>: serves
/// twine/1 on stdin/stdout until <c>bye</c> or end of input. Stdout carries only the protocol;
/// logs go to stderr or the <c>--log</c> file.
/// </summary>
public static class EngineVerb
{
    public static Command Build()
    {
        var strategy = new Option<string?>("--strategy") { Description = $"Player to serve: {string.Join(", ", Players.Names)} (default: the strongest available)" };
        var budget = new Option<long>("--budget-ms") { Description = "Thinking budget per move when think gives no clock, and the cap when it does", DefaultValueFactory = _ => EngineSettings.DefaultBudgetMs };
        var seed = new Option<int>("--seed") { Description = "Seed for players that use chance", DefaultValueFactory = _ => 1 };
        var command = new Command("engine", "Serve the twine/1 protocol on stdin and stdout (see docs/protocol.md)") { strategy, budget, seed };
        command.Options.Add(DbOption.Option);
        command.SetAction(parse => Failures.Guard(() =>
        {
            var settings = Settings(parse.GetValue(strategy), parse.GetValue(budget), parse.GetValue(seed));
            var db = parse.GetValue(DbOption.Option);
            // Check the database before serving, so a bad file is a bad-input exit rather than a broken session.
            DbOption.Load(db, new ValueContext());
            var setup = new EngineSetup
            {
                Version = EngineSetup.VersionOf(typeof(EngineVerb).Assembly),
                Settings = settings,
                CreateValueContext = () =>
                {
                    var context = new ValueContext();
                    DbOption.Load(db, context);
                    return context;
                },
                Log = Log.Logger,
            };
            using var stdin = Console.OpenStandardInput();
            using var stdout = Console.OpenStandardOutput();
            return new EngineHost(setup).Serve(stdin, stdout);
        }));
        return command;
    }

    private static EngineSettings Settings(string? strategy, long budgetMs, int seed)
    {
        var settings = EngineSettings.Default(Players.Names) with { Seed = seed };
        if (strategy is not null)
        {
            var known = Players.Names.FirstOrDefault(n => string.Equals(n, strategy, StringComparison.OrdinalIgnoreCase))
                ?? throw new InputException($"--strategy: unknown strategy '{strategy}'; known: {string.Join(", ", Players.Names)}");
            settings = settings with { Strategy = known };
        }
        if (budgetMs is < 1 or > EngineSettings.MostMs)
            throw new InputException($"--budget-ms: needs whole milliseconds from 1 to {EngineSettings.MostMs}, got {budgetMs}");
        return settings with { BudgetMs = budgetMs };
    }
}
