using System.Reflection;
using System.Runtime.InteropServices;
using Microsoft.Z3;

namespace LogicProof.Proof.Solving;

/// <summary>
/// Binds the Microsoft.Z3 managed API to a native Z3 library. <see cref="EnsureLoaded"/> must run
/// before the first use of any Microsoft.Z3 type that reaches native code (e.g. <c>new Context()</c>).
/// </summary>
/// <remarks>
/// On Linux the package ships no native library; the distribution's libz3.so.4 is used through
/// liblogicproof_z3compat.so, built from Native/z3compat.c next to the application.
/// On Windows and macOS the library shipped in the package is used as is.
/// </remarks>
public static class Z3Runtime
{
    public const string CompatLibraryFileName = "liblogicproof_z3compat.so";

    private const string ManagedImportName = "libz3";

    private static readonly Lock Gate = new();
    private static volatile bool loaded;
    private static SolverUnavailableException? failure;
    private static IntPtr compatHandle;
    private static string? version;

    /// <summary>Native Z3 version in use, e.g. "4.8.12.0".</summary>
    public static string Version
    {
        get
        {
            EnsureLoaded();
            return version!;
        }
    }

    /// <summary>
    /// Installs the native library resolver for Microsoft.Z3 once and checks that Z3 answers.
    /// Safe to call from any thread, any number of times.
    /// </summary>
    /// <exception cref="SolverUnavailableException">The native library cannot be loaded.</exception>
    public static void EnsureLoaded()
    {
        if (loaded)
        {
            return;
        }

        lock (Gate)
        {
            if (loaded)
            {
                return;
            }

            if (failure is not null)
            {
                throw new SolverUnavailableException(failure.Message, failure);
            }

            try
            {
                Load();
            }
            catch (SolverUnavailableException e)
            {
                failure = e;
                throw;
            }

            loaded = true;
        }
    }

    /// <summary>Releases the shim still holds back for a native context (tests only).</summary>
    internal static long PendingReleases(IntPtr nativeContext)
    {
        EnsureLoaded();
        if (compatHandle == IntPtr.Zero)
        {
            return 0;
        }

        var pending = Marshal.GetDelegateForFunctionPointer<PendingFunction>(
            NativeLibrary.GetExport(compatHandle, "logicproof_z3compat_pending"));
        return (long)pending(nativeContext);
    }

    private static void Load()
    {
        if (OperatingSystem.IsLinux())
        {
            compatHandle = LoadCompatLibrary();
        }

        try
        {
            NativeLibrary.SetDllImportResolver(typeof(Context).Assembly, Resolve);
        }
        catch (InvalidOperationException e)
        {
            throw Unavailable("another component already installed a native library resolver for Microsoft.Z3", e);
        }

        try
        {
            version = global::Microsoft.Z3.Version.ToString();
        }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException or BadImageFormatException)
        {
            throw Unavailable(e.Message, e);
        }
    }

    private static IntPtr LoadCompatLibrary()
    {
        var directories = new[] { AppContext.BaseDirectory, Path.GetDirectoryName(typeof(Z3Runtime).Assembly.Location) }
            .Where(d => !string.IsNullOrEmpty(d))
            .Select(d => Path.TrimEndingDirectorySeparator(Path.GetFullPath(d!)))
            .Distinct()
            .ToList();
        var path = directories
            .Select(d => Path.Combine(d, CompatLibraryFileName))
            .FirstOrDefault(File.Exists);
        if (path is null)
        {
            throw Unavailable(
                $"{CompatLibraryFileName} was not found in {string.Join(" or ", directories)}; "
                + "it is compiled with gcc when LogicProof is built, and the build skips it (with a message) when gcc or libz3 is missing");
        }

        try
        {
            return NativeLibrary.Load(path);
        }
        catch (Exception e) when (e is DllNotFoundException or BadImageFormatException)
        {
            throw Unavailable(e.Message, e);
        }
    }

    private static IntPtr Resolve(string libraryName, Assembly assembly, DllImportSearchPath? searchPath) =>
        libraryName == ManagedImportName ? compatHandle : IntPtr.Zero;

    private static SolverUnavailableException Unavailable(string reason, Exception? inner = null)
    {
        var fix = OperatingSystem.IsLinux()
            ? "On Debian/Ubuntu install the Z3 runtime with 'apt-get install libz3-4' and the C compiler "
              + $"that builds {CompatLibraryFileName} with 'apt-get install gcc', then rebuild LogicProof."
            : "Make sure the native Z3 library of the Microsoft.Z3 package (libz3.dll / libz3.dylib) "
              + "is next to the application and matches the process architecture.";
        var message = $"The Z3 solver library could not be loaded. {fix} Reason: {reason}";
        return inner is null ? new SolverUnavailableException(message) : new SolverUnavailableException(message, inner);
    }

    [UnmanagedFunctionPointer(CallingConvention.Cdecl)]
    private delegate nuint PendingFunction(IntPtr nativeContext);
}
