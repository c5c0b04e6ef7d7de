using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Design;

/// <summary>
/// A steel design standard module. One implementation per standard (SANS 10162-1 first), one file per
/// clause group. <see cref="Version"/> is the module's code version: it enters every fingerprint, so a
/// change of a formula makes earlier approvals stale.
/// </summary>
public interface IDesignStandard
{
    /// <summary>Short code, e.g. "SANS 10162-1".</summary>
    string Code { get; }

    /// <summary>Edition followed, e.g. "SANS 10162-1:2011 (CSA S16 formulas)".</summary>
    string Edition { get; }

    /// <summary>Code version of this module, e.g. "1.0.0".</summary>
    string Version { get; }

    /// <summary>Issues with the member's input (lengths, material, connection, connectors) naming the field and limit.</summary>
    IReadOnlyList<ValidationIssue> Validate(DesignMember member);

    /// <summary>Checks a member for its forces. <paramref name="withRecord"/> false skips the record (sizing loops).</summary>
    /// <exception cref="InputValidationException">The member fails <see cref="Validate"/>.</exception>
    MemberDesignResult CheckMember(DesignMember member, MemberForces forces, bool withRecord = true);
}
