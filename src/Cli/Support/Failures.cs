using Bramble.Rules;
using Bramble.Values;
using Serilog;

namespace Bramble.Cli;

/// <summary>Runs a verb body and turns the errors people cause into messages and exit codes.</summary>
public static class Failures
{
    public static int Guard(Func<int> body)
    {
        try
        {
            return body();
        }
        catch (PositionSyntaxException e)
        {
            Console.Error.WriteLine("bad position:");
            Console.Error.WriteLine(e.Pointer);
            return Entry.BadInput;
        }
        catch (ValueSyntaxException e)
        {
            Console.Error.WriteLine("bad value:");
            Console.Error.WriteLine(e.Pointer);
            return Entry.BadInput;
        }
        catch (IllegalMoveException e)
        {
            Console.Error.WriteLine($"bad move: {e.Message}");
            return Entry.BadInput;
        }
        catch (InputException e)
        {
            Console.Error.WriteLine(e.Message);
            return Entry.BadInput;
        }
        catch (ArgumentException e)
        {
            Console.Error.WriteLine(e.Message);
            return Entry.BadInput;
        }
        catch (BudgetExceededException e)
        {
            Console.Error.WriteLine($"gave up: {e.Message}");
            return Entry.JobFailed;
        }
        catch (IOException e)
        {
            Log.Error(e, "I/O failure");
            Console.Error.WriteLine($"could not do the job: {e.Message}");
            return Entry.JobFailed;
        }
    }
}
