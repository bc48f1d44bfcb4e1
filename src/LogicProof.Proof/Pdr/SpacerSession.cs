using LogicProof.Proof.Solving;
using Microsoft.Z3;

namespace LogicProof.Proof.Pdr;

/// <summary>
/// The PDR engine's own Z3 context and its cancellation. Spacer runs inside one long native call, so cancelling means
/// interrupting the context while that call runs: from the moment the token is cancelled, every 50 ms for as long as
/// the query runs (an interrupt that arrives before Z3 has entered the query is not remembered, so one is not
/// enough). No interrupt is sent outside the query: after a cancelled query the context keeps Z3's "canceled" error
/// code, and the managed API then throws from any later call, Interrupt included (such a throw is ignored here).
/// </summary>
internal sealed class SpacerSession : IDisposable
{
    private static readonly TimeSpan InterruptPeriod = TimeSpan.FromMilliseconds(50);

    private readonly Lock _gate = new();
    private readonly CancellationToken _cancellationToken;
    private Timer? _interrupter;
    private bool _querying;
    private bool _disposed;

    public SpacerSession(CancellationToken cancellationToken)
    {
        Z3Runtime.EnsureLoaded();
        Context = new Context(new Dictionary<string, string> { ["model"] = "true" });
        _cancellationToken = cancellationToken;
    }

    public Context Context { get; }

    public bool IsCancelled => _cancellationToken.IsCancellationRequested;

    /// <summary>Runs <paramref name="query"/> (one Spacer query) so that cancelling the token interrupts it.</summary>
    public T Run<T>(Func<T> query)
    {
        lock (_gate)
        {
            _querying = true;
        }

        try
        {
            using var registration = _cancellationToken.Register(StartInterrupting);
            return query();
        }
        finally
        {
            lock (_gate)
            {
                _querying = false;
                _interrupter?.Dispose();
                _interrupter = null;
            }
        }
    }

    public void Dispose()
    {
        lock (_gate)
        {
            if (_disposed)
            {
                return;
            }

            _disposed = true;
            _interrupter?.Dispose();
        }

        Context.Dispose();
    }

    private void StartInterrupting()
    {
        lock (_gate)
        {
            if (_querying && !_disposed && _interrupter is null)
            {
                _interrupter = new Timer(_ => Interrupt(), null, TimeSpan.Zero, InterruptPeriod);
            }
        }
    }

    private void Interrupt()
    {
        lock (_gate)
        {
            if (!_querying || _disposed)
            {
                return;
            }

            try
            {
                Context.Interrupt();
            }
            catch (Z3Exception)
            {
                // The query has just been cancelled and left its error code behind; the query is ending anyway.
            }
        }
    }
}
