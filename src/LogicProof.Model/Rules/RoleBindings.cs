namespace LogicProof.Model.Rules;

/// <summary>
/// The roles a scheme binds, by role name (compared ordinally, ignoring case). A role with an error in its
/// binding is left out, so rules that need it are reported as not applicable rather than checked wrongly.
/// </summary>
public sealed class RoleBindings
{
    private readonly Dictionary<string, BoundRole> _roles;

    public RoleBindings(IEnumerable<BoundRole> roles)
    {
        ArgumentNullException.ThrowIfNull(roles);
        _roles = roles.ToDictionary(role => role.Definition.Name, StringComparer.OrdinalIgnoreCase);
    }

    public static RoleBindings None { get; } = new([]);

    /// <summary>The bound roles in the order of <see cref="RoleCatalog.All"/>.</summary>
    public IReadOnlyList<BoundRole> All =>
        [.. RoleCatalog.All.Where(definition => _roles.ContainsKey(definition.Name)).Select(definition => _roles[definition.Name])];

    public bool IsBound(string role) => _roles.ContainsKey(role);

    public BoundRole? Find(string role) => _roles.GetValueOrDefault(role);

    public BoundRole Get(string role) =>
        _roles.TryGetValue(role, out var bound) ? bound : throw new KeyNotFoundException($"the role '{role}' is not bound");
}
