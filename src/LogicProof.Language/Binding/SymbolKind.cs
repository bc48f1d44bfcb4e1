namespace LogicProof.Language.Binding;

public enum SymbolKind
{
    Input,
    Setting,
    Local,
    Output,
}
