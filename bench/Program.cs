using BenchmarkDotNet.Running;

// Run with: dotnet run -c Release --project bench -- --filter '*'
// or: dotnet run -c Release --project bench -- boards 6x6 7x7 (the whole-board ablation table)
if (args.Length > 0 && args[0] == "boards") Bramble.Bench.BoardAblation.Run(args[1..]);
else BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
