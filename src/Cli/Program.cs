using Bramble.Cli;

return Bramble.Cli.Entry.Run(args);
