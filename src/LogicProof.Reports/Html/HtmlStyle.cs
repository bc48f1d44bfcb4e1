namespace LogicProof.Reports.Html;

/// <summary>The page's only style sheet, inline so the report is one self-contained file.</summary>
internal static class HtmlStyle
{
    public const string Css = """
        body { font-family: system-ui, sans-serif; margin: 2em; color: #1b1b1b; max-width: 90em; }
        h1 { font-size: 1.6em; margin-bottom: 0.2em; }
        h2 { font-size: 1.3em; margin-top: 1.6em; border-bottom: 1px solid #ccc; }
        h3 { font-size: 1.1em; margin-top: 1.4em; }
        .meta { color: #555; margin-top: 0; }
        .safety { border: 2px solid #8a6d00; background: #fff8dc; padding: 0.8em 1em; margin: 1em 0; }
        table { border-collapse: collapse; margin: 0.6em 0; }
        th, td { border: 1px solid #ccc; padding: 0.2em 0.6em; text-align: left; vertical-align: top; }
        th { background: #f2f2f2; }
        .proved { color: #1a6b1a; font-weight: bold; }
        .violated { color: #a40000; font-weight: bold; }
        .inconclusive { color: #8a6d00; font-weight: bold; }
        .not-applicable { color: #555; font-weight: bold; }
        .error { color: #a40000; }
        .warning { color: #8a6d00; }
        table.trace td, table.trace th { font-family: ui-monospace, monospace; font-size: 0.9em; }
        table.trace tr.failing td { background: #ffe5e5; }
        table.trace td.changed { font-weight: bold; background: #eef4ff; }
        ul.why, ul.why ul { list-style: none; padding-left: 1.4em; font-family: ui-monospace, monospace; font-size: 0.9em; }
        figure { margin: 1em 0; overflow-x: auto; }
        figcaption { color: #555; font-size: 0.9em; }
        svg text { font-family: ui-monospace, monospace; font-size: 11px; }
        """;
}
