using Hangfire.Logging;

namespace Seepage.Api.Jobs;

/// <summary>Hangfire's log output into the host's logging. Hangfire keeps its log provider in a process-wide setting; when
/// several hosts live in one process (the integration tests) one may outlive another's logger factory, so a disposed
/// factory drops the message instead of failing the job.</summary>
public sealed class HostLogProvider(ILoggerFactory factory) : ILogProvider
{
    public ILog GetLogger(string name) => new HostLog(factory, name);

    private sealed class HostLog(ILoggerFactory factory, string name) : ILog
    {
        public bool Log(Hangfire.Logging.LogLevel level, Func<string>? message, Exception? exception = null)
        {
            try
            {
                var logger = factory.CreateLogger(name);
                var mapped = level switch
                {
                    Hangfire.Logging.LogLevel.Trace => Microsoft.Extensions.Logging.LogLevel.Trace,
                    Hangfire.Logging.LogLevel.Debug => Microsoft.Extensions.Logging.LogLevel.Debug,
                    Hangfire.Logging.LogLevel.Info => Microsoft.Extensions.Logging.LogLevel.Information,
                    Hangfire.Logging.LogLevel.Warn => Microsoft.Extensions.Logging.LogLevel.Warning,
                    Hangfire.Logging.LogLevel.Error => Microsoft.Extensions.Logging.LogLevel.Error,
                    _ => Microsoft.Extensions.Logging.LogLevel.Critical,
                };
                if (message is null) return logger.IsEnabled(mapped);
                logger.Log(mapped, exception, "{Message}", message());
                return true;
            }
            catch (ObjectDisposedException) { return false; }
        }
    }
}
