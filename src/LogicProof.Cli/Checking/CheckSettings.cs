using LogicProof.Model.Rules;
using LogicProof.Proof.Orchestration;

namespace LogicProof.Cli.Checking;

/// <summary>What one <c>check</c> run was asked to do, from the command line.</summary>
public sealed record CheckSettings(
    bool StaticOnly,
    RuleSelection Rules,
    CheckOptions Proof,
    bool ConstantChecks);
