using System.Text;
using System.Xml;
using LogicProof.Core.Diagnostics;
using LogicProof.Proof.Results;
using LogicProof.Reports.Exports;

namespace LogicProof.Reports.Check;

/// <summary>
/// The check report as JUnit XML, for CI test dashboards: one <c>testsuite</c> per file and in it
/// <list type="bullet">
/// <item>a <c>static checks</c> test case that fails when the file has errors (so a file that could not be read
/// never looks green);</item>
/// <item>one test case per property: proved passes; violated is a <c>failure</c> whose text is the counterexample
/// table and its justification; inconclusive is an <c>error</c> (the check did not complete, and the requirement
/// is not established: a dashboard must not show it as passed or quietly skipped);</item>
/// <item>one test case per rule that did not apply, <c>skipped</c> with the missing roles.</item>
/// </list>
/// Each suite's properties hold the path, the versions, the scan timing, the breaker sentence and the safety
/// statement, which <c>system-out</c> repeats with the diagnostics and power-up notes. Times are seconds with
/// three decimals; there are no timestamps or host names, so the same report gives the same bytes.
/// </summary>
public static class JUnitReportRenderer
{
    private const string Declaration = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";

    public static void Render(CheckReport report, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(writer);
        var text = new StringBuilder();
        var settings = new XmlWriterSettings
        {
            Indent = true,
            IndentChars = "  ",
            NewLineChars = "\n",
            NewLineHandling = NewLineHandling.Replace,
            OmitXmlDeclaration = true,
        };
        using (var xml = XmlWriter.Create(text, settings))
        {
            xml.WriteStartElement("testsuites");
            xml.WriteAttributeString("name", "LogicProof check");
            WriteCounts(xml, report.Files, report.Files.SelectMany(f => f.Properties).Aggregate(TimeSpan.Zero, (sum, p) => sum + p.Elapsed));
            foreach (var file in report.Files)
            {
                WriteSuite(xml, report, file);
            }

            xml.WriteEndElement();
        }

        writer.Write(Declaration);
        writer.Write(text.ToString());
        writer.Write('\n');
    }

    private static void WriteCounts(XmlWriter xml, IReadOnlyList<FileCheckReport> files, TimeSpan time)
    {
        var tests = files.Sum(f => 1 + f.Properties.Count + f.NotApplicableRules.Count);
        var failures = files.Sum(f => (f.Diagnostics.Any(d => d.IsError) ? 1 : 0) + f.Properties.Count(p => p.Verdict is Violated));
        xml.WriteAttributeString("tests", ReportSentences.Count(tests));
        xml.WriteAttributeString("failures", ReportSentences.Count(failures));
        xml.WriteAttributeString("errors", ReportSentences.Count(files.Sum(f => f.Properties.Count(p => p.Verdict is Inconclusive))));
        xml.WriteAttributeString("skipped", ReportSentences.Count(files.Sum(f => f.NotApplicableRules.Count)));
        xml.WriteAttributeString("time", ReportSentences.Seconds(time));
    }

    private static void WriteSuite(XmlWriter xml, CheckReport report, FileCheckReport file)
    {
        var suite = file.SchemeName ?? file.Path;
        xml.WriteStartElement("testsuite");
        xml.WriteAttributeString("name", XmlText.Clean(suite));
        WriteCounts(xml, [file], file.Properties.Aggregate(TimeSpan.Zero, (sum, p) => sum + p.Elapsed));
        xml.WriteStartElement("properties");
        Property(xml, "path", file.Path);
        Property(xml, "toolVersion", report.ToolVersion);
        Property(xml, "z3Version", report.Z3Version);
        Property(xml, "scanTiming", file.ScanTimingText);
        Property(xml, "breaker", ReportSentences.Breaker(file.BreakerModelled));
        Property(xml, "safetyStatement", SafetyStatement.Text);
        xml.WriteEndElement();

        WriteStaticChecks(xml, file, suite);
        foreach (var property in file.Properties)
        {
            WriteProperty(xml, suite, property);
        }

        foreach (var rule in file.NotApplicableRules)
        {
            StartCase(xml, rule.RuleId, suite + ".rule", TimeSpan.Zero);
            xml.WriteStartElement("skipped");
            xml.WriteAttributeString("message", XmlText.Clean("not applicable: " + ReportSentences.MissingRoles(rule)));
            xml.WriteEndElement();
            xml.WriteEndElement();
        }

        xml.WriteElementString("system-out", XmlText.Clean(SystemOut(file)));
        xml.WriteEndElement();
    }

    private static void WriteStaticChecks(XmlWriter xml, FileCheckReport file, string suite)
    {
        StartCase(xml, "static checks", suite + ".static", TimeSpan.Zero);
        var errors = file.Diagnostics.Where(d => d.IsError).ToList();
        if (errors.Count > 0)
        {
            xml.WriteStartElement("failure");
            xml.WriteAttributeString("message", errors.Count == 1 ? "1 error" : ReportSentences.Count(errors.Count) + " errors");
            xml.WriteAttributeString("type", "static");
            xml.WriteString(XmlText.Clean(string.Join("\n", errors.Select(ReportSentences.DiagnosticLine))));
            xml.WriteEndElement();
        }

        xml.WriteEndElement();
    }

    private static void WriteProperty(XmlWriter xml, string suite, PropertyReport property)
    {
        StartCase(xml, property.Name, suite + "." + ReportSentences.Origin(property.Origin), property.Elapsed);
        switch (property.Verdict)
        {
            case Violated when property.Counterexample is { } view:
                xml.WriteStartElement("failure");
                xml.WriteAttributeString("message", XmlText.Clean(TraceSummary.Headline(property, view)));
                xml.WriteAttributeString("type", "violated");
                var trace = new StringWriter { NewLine = "\n" };
                CounterexampleTextExporter.Write(view, trace, string.Empty);
                xml.WriteString(XmlText.Clean(trace.ToString()));
                xml.WriteEndElement();
                break;
            case Inconclusive inconclusive:
                xml.WriteStartElement("error");
                xml.WriteAttributeString("message", XmlText.Clean("inconclusive: " + inconclusive.Reason));
                xml.WriteAttributeString("type", "inconclusive");
                xml.WriteString(XmlText.Clean(
                    $"neither proved nor violated: {inconclusive.Reason}; no violation within {ReportSentences.Count(inconclusive.DepthReached)} steps."));
                xml.WriteEndElement();
                break;
        }

        xml.WriteEndElement();
    }

    private static string SystemOut(FileCheckReport file)
    {
        var lines = new List<string> { SafetyStatement.Text };
        if (file.SchemeName is not null)
        {
            lines.Add($"scheme {file.SchemeName}, {file.ScanTimingText}");
            lines.Add(ReportSentences.Breaker(file.BreakerModelled));
        }

        lines.AddRange(file.Diagnostics.Select(ReportSentences.DiagnosticLine));
        lines.AddRange(file.Properties.Where(p => p.Statement is not null).Select(p => $"{p.Name}: {p.Statement}"));
        lines.AddRange(file.PowerUpNotes.Select(note => "power-up: " + ReportSentences.PowerUp(note)));
        return string.Join("\n", lines);
    }

    private static void StartCase(XmlWriter xml, string name, string className, TimeSpan time)
    {
        xml.WriteStartElement("testcase");
        xml.WriteAttributeString("name", XmlText.Clean(name));
        xml.WriteAttributeString("classname", XmlText.Clean(className));
        xml.WriteAttributeString("time", ReportSentences.Seconds(time));
    }

    private static void Property(XmlWriter xml, string name, string value)
    {
        xml.WriteStartElement("property");
        xml.WriteAttributeString("name", name);
        xml.WriteAttributeString("value", XmlText.Clean(value));
        xml.WriteEndElement();
    }
}
