using System.Globalization;
using System.Runtime.ExceptionServices;

namespace LogicProof.Core.Threading;

/// <summary>
/// Runs a function on a dedicated thread with a 512 MB stack. Syntax trees of long flat chains
/// (<c>a AND b AND c ...</c>) are deep left spines, and every recursive pass over them needs far more stack than a
/// default thread has; a stack overflow cannot be caught in .NET, so deep passes run here instead.
/// The caller's culture is carried over, the caller waits for the result, and an exception thrown by the function
/// is rethrown to the caller with its original stack trace. A call made while already on such a thread runs inline.
/// </summary>
public static class LargeStack
{
    private const int StackBytes = 512 * 1024 * 1024;

    [ThreadStatic]
    private static bool _onLargeStack;

    public static T Run<T>(Func<T> function)
    {
        ArgumentNullException.ThrowIfNull(function);
        if (_onLargeStack)
        {
            return function();
        }

        var culture = CultureInfo.CurrentCulture;
        var uiCulture = CultureInfo.CurrentUICulture;
        T result = default!;
        ExceptionDispatchInfo? failure = null;
        var thread = new Thread(
            () =>
            {
                _onLargeStack = true;
                CultureInfo.CurrentCulture = culture;
                CultureInfo.CurrentUICulture = uiCulture;
                try
                {
                    result = function();
                }
                catch (Exception ex)
                {
                    failure = ExceptionDispatchInfo.Capture(ex);
                }
            },
            StackBytes)
        {
            IsBackground = true,
            Name = "LogicProof large stack",
        };
        thread.Start();
        thread.Join();
        failure?.Throw();
        return result;
    }
}
