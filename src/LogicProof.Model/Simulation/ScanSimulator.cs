using LogicProof.Model.Scan;

namespace LogicProof.Model.Simulation;

/// <summary>
/// Runs a <see cref="ScanModel"/> scan by scan, exactly as documented on <see cref="ScanModel"/>,
/// <see cref="ScanStep"/> and <see cref="StateSlot"/>. <see cref="Compile"/> turns the model into straight-line
/// code once; each <see cref="Step"/> then samples the inputs, runs the steps in order and moves every state slot
/// to its next value.
/// <para>
/// Three kinds of use. A whole input trace (the <c>simulate</c> command): take <see cref="PowerUpState"/> and call
/// <see cref="Step"/> once per scan. A counterexample replay: build the power-up state with every unknown latch
/// given (or set each slot of <see cref="CreateState"/>), then <see cref="Replay"/> the inputs and read each
/// scan's cells, properties and assumptions (they are bool cells) from the returned values. An explicit-state
/// explorer: <see cref="ScanState"/> compares and hashes by value and clones cheaply, and <see cref="Step"/>
/// runs from any state with any inputs.
/// </para>
/// One simulator may serve several threads at once, each stepping its own states, inputs and values: the
/// compiled code holds no data of its own.
/// </summary>
public sealed class ScanSimulator
{
    private readonly ScanStateLayout _layout;
    private readonly ScanProgram _program;

    private ScanSimulator(ScanModel model, ScanStateLayout layout, ScanProgram program)
    {
        Model = model;
        _layout = layout;
        _program = program;
        UnknownPowerUpSlots = [.. model.StateSlots.Where(slot => slot.PowerUp is UnknownPowerUp)];
    }

    public ScanModel Model { get; }

    /// <summary>The latches (SR, RS, seal-in loops) declared without a power-up value: the caller chooses each one.</summary>
    public IReadOnlyList<StateSlot> UnknownPowerUpSlots { get; }

    /// <summary>Number of compiled code chunks; tells tests and the benchmark how the model was split.</summary>
    public int CompiledChunkCount => _program.ChunkCount;

    /// <summary>Checks the model and compiles it. Throws <see cref="ArgumentException"/> if the model is inconsistent.</summary>
    public static ScanSimulator Compile(ScanModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var layout = new ScanStateLayout(model.StateSlots);
        var program = ScanProgramCompiler.Compile(model, layout);
        var simulator = new ScanSimulator(model, layout, program);
        simulator.CheckPowerUpValues();
        return simulator;
    }

    /// <summary>A state with every slot FALSE or 0, whatever the power-up declarations; for callers that set every slot.</summary>
    public ScanState CreateState() => new(_layout);

    public ScanInputs CreateInputs() => new(Model);

    public ScanValues CreateValues() => new(Model);

    /// <summary>
    /// The state before the first scan: each slot's declared power-up value, and for each slot in
    /// <see cref="UnknownPowerUpSlots"/> the value given in <paramref name="unknownSlotValues"/> (keyed by slot index).
    /// Throws <see cref="ArgumentException"/> if an unknown slot has no value or a key is not an unknown slot.
    /// </summary>
    public ScanState PowerUpState(IReadOnlyDictionary<int, bool>? unknownSlotValues)
    {
        var result = BuildPowerUp(unknownSlotValues, defaultMissingToFalse: false);
        return result.State;
    }

    /// <summary>
    /// As <see cref="PowerUpState"/>, except that an unknown slot without a given value starts FALSE; the result
    /// lists those slots so the caller can tell the user.
    /// </summary>
    public PowerUpResult PowerUpStateDefaultingUnknownToFalse(IReadOnlyDictionary<int, bool>? unknownSlotValues) =>
        BuildPowerUp(unknownSlotValues, defaultMissingToFalse: true);

    /// <summary>
    /// Runs one scan: takes <paramref name="inputs"/> as this scan's inputs, computes every cell into
    /// <paramref name="into"/>, and leaves in <paramref name="state"/> the state after the scan.
    /// </summary>
    public void Step(ScanState state, ScanInputs inputs, ScanValues into)
    {
        if (!ReferenceEquals(state.Layout, _layout))
        {
            throw new ArgumentException("the state was created by another simulator.", nameof(state));
        }

        if (!inputs.BelongsTo(Model) || !ReferenceEquals(into.Model, Model))
        {
            throw new ArgumentException("the inputs or values belong to another model.");
        }

        inputs.CopyInto(into.Bools, into.Reals);
        _program.Run(into.Bools, into.Reals, state.Bools, state.Counters, state.Reals);
    }

    /// <summary>
    /// Runs one scan per element of <paramref name="inputsPerScan"/> from <paramref name="start"/> (left unchanged)
    /// and returns every scan's values; for short traces such as counterexamples.
    /// </summary>
    public IReadOnlyList<ScanValues> Replay(ScanState start, IEnumerable<ScanInputs> inputsPerScan)
    {
        var state = start.Clone();
        var values = CreateValues();
        var scans = new List<ScanValues>();
        foreach (var inputs in inputsPerScan)
        {
            Step(state, inputs, values);
            scans.Add(values.Clone());
        }

        return scans;
    }

    private PowerUpResult BuildPowerUp(IReadOnlyDictionary<int, bool>? given, bool defaultMissingToFalse)
    {
        given ??= new Dictionary<int, bool>();
        foreach (var slot in given.Keys)
        {
            if ((uint)slot >= (uint)Model.StateSlots.Count || Model.StateSlots[slot].PowerUp is not UnknownPowerUp)
            {
                throw new ArgumentException($"state slot {slot} is not a latch of unknown power-up.", nameof(given));
            }
        }

        var state = CreateState();
        var defaulted = new List<StateSlot>();
        foreach (var slot in Model.StateSlots)
        {
            switch (slot.PowerUp)
            {
                case KnownBoolPowerUp known:
                    state.SetBool(slot.Index, known.Value);
                    break;
                case KnownCounterPowerUp known:
                    state.SetCounter(slot.Index, known.Value);
                    break;
                case KnownRealPowerUp known:
                    state.SetReal(slot.Index, known.Value);
                    break;
                default:
                    if (given.TryGetValue(slot.Index, out var value))
                    {
                        state.SetBool(slot.Index, value);
                    }
                    else
                    {
                        defaulted.Add(slot);
                    }

                    break;
            }
        }

        if (defaulted.Count > 0 && !defaultMissingToFalse)
        {
            throw new ArgumentException(
                "no power-up value given for the latches " + string.Join(", ", defaulted.Select(slot => $"'{slot.Name}' (slot {slot.Index})")) + ".",
                nameof(given));
        }

        return new PowerUpResult(state, defaulted);
    }

    private void CheckPowerUpValues()
    {
        foreach (var slot in Model.StateSlots)
        {
            var storage = _layout.StorageOfSlot[slot.Index];
            var fits = slot.PowerUp switch
            {
                KnownBoolPowerUp => storage == SlotStorage.Bool,
                KnownCounterPowerUp counter => storage == SlotStorage.Counter && counter.Value >= 0 && counter.Value <= slot.CounterMax,
                KnownRealPowerUp => storage == SlotStorage.Real,
                UnknownPowerUp => storage == SlotStorage.Bool,
                _ => false,
            };
            if (!fits)
            {
                throw new ArgumentException($"inconsistent scan model: state slot '{slot.Name}' has power-up {slot.PowerUp} that does not fit its kind {slot.Kind}.");
            }
        }
    }
}
