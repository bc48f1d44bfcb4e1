using System.Diagnostics;
using System.Globalization;
using LogicProof.Proof.Solving;
using Microsoft.Z3;

namespace LogicProof.Proof.Engines;

/// <summary>
/// One engine run's own Z3 context (contexts are not thread-safe), with its cancellation and time limit. Every
/// check gets the remaining time as Z3's "timeout"; on cancellation a running check is interrupted, and so is every
/// check still running or started in the next 50 ms periods until disposal (an interrupt that arrives between two
/// checks is not remembered). A check that is cancelled, times out or gives up returns UNKNOWN with
/// <see cref="LastUnknownReason"/> set. Other Z3 calls made while an interrupt lands may throw
/// <see cref="Z3Exception"/>: engines catch it when <see cref="IsStopped"/> and report Inconclusive.
/// </summary>
public sealed class SolverSession : IDisposable
{
    private static readonly TimeSpan InterruptPeriod = TimeSpan.FromMilliseconds(50);

    private readonly Lock _gate = new();
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly TimeSpan? _timeLimit;
    private readonly CancellationToken _cancellationToken;
    private readonly CancellationTokenRegistration _registration;
    private Timer? _interrupter;
    private bool _checking;
    private bool _disposed;

    public SolverSession(TimeSpan? timeLimit, CancellationToken cancellationToken)
    {
        Z3Runtime.EnsureLoaded();
        Context = new Context(new Dictionary<string, string> { ["model"] = "true" });
        _timeLimit = timeLimit;
        _cancellationToken = cancellationToken;
        _registration = cancellationToken.Register(StartInterrupting);
    }

    public Context Context { get; }

    public bool IsCancelled => _cancellationToken.IsCancellationRequested;

    public bool IsOutOfTime => _timeLimit is { } limit && _clock.Elapsed >= limit;

    /// <summary>Cancelled or out of time: whatever the engine has not concluded yet is Inconclusive.</summary>
    public bool IsStopped => IsCancelled || IsOutOfTime;

    public string StopReason => IsCancelled ? "cancelled" : "time limit reached";

    public string LastUnknownReason { get; private set; } = string.Empty;

    public Solver NewSolver() => Context.MkSolver();

    /// <summary>Checks under assumption literals (no push/pop), within the remaining time.</summary>
    public Status Check(Solver solver, params BoolExpr[] assumptions)
    {
        if (IsCancelled)
        {
            LastUnknownReason = "cancelled";
            return Status.UNKNOWN;
        }

        if (_timeLimit is { } limit)
        {
            var remaining = limit - _clock.Elapsed;
            if (remaining <= TimeSpan.Zero)
            {
                LastUnknownReason = "time limit reached";
                return Status.UNKNOWN;
            }

            solver.Set("timeout", (uint)Math.Clamp(Math.Ceiling(remaining.TotalMilliseconds), 1, uint.MaxValue));
        }

        Status status;
        lock (_gate)
        {
            _checking = true;
        }

        try
        {
            status = solver.Check((Expr[])assumptions);
        }
        finally
        {
            lock (_gate)
            {
                _checking = false;
            }
        }

        if (status == Status.UNKNOWN)
        {
            LastUnknownReason = IsCancelled ? "cancelled"
                : IsOutOfTime ? "time limit reached"
                : string.Create(CultureInfo.InvariantCulture, $"the solver gave up ({solver.ReasonUnknown})");
        }

        return status;
    }

    public void Dispose()
    {
        _registration.Dispose();
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
            if (_disposed || _interrupter is not null)
            {
                return;
            }

            _interrupter = new Timer(_ => Interrupt(), null, TimeSpan.Zero, InterruptPeriod);
        }
    }

    private void Interrupt()
    {
        lock (_gate)
        {
            if (!_disposed && _checking)
            {
                Context.Interrupt();
            }
        }
    }
}
