namespace LogicProof.Cli.Checking;

public enum ReportFormat
{
    Text,
    Json,
    Sarif,
    Junit,
    Html,
}
