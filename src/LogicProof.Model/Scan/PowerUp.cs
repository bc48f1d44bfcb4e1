using Fractions;

namespace LogicProof.Model.Scan;

/// <summary>
/// The value a memory holds before the first scan. Memories start FALSE or 0 unless declared otherwise; a latch
/// (SR, RS or a seal-in loop) without a declared value is <see cref="UnknownPowerUp"/>: it has no de-energised
/// state, so every proof must hold for both values and the simulator must be told which one to use.
/// </summary>
public abstract record PowerUp;

public sealed record KnownBoolPowerUp(bool Value) : PowerUp;

public sealed record KnownRealPowerUp(Fraction Value) : PowerUp;

public sealed record KnownCounterPowerUp(int Value) : PowerUp;

public sealed record UnknownPowerUp : PowerUp;
