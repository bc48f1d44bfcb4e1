namespace LogicProof.Model.SyncCheck;

/// <summary>
/// A synchronism-check input that no calculation can accept. The message is written for the person who typed the
/// value, so it can be shown on its own, on one line.
/// </summary>
public sealed class SyncCheckInputException : ArgumentException
{
    public SyncCheckInputException()
    {
    }

    public SyncCheckInputException(string message)
        : base(message)
    {
    }

    public SyncCheckInputException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
