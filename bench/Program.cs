using BenchmarkDotNet.Running;

// Run with: dotnet run -c Release --project bench -- --filter '*'
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
