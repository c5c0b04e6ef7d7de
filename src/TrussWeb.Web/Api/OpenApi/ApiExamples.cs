namespace TrussWeb.Web.Api.OpenApi;

/// <summary>Example request bodies by endpoint name (invented values; the demo project's names where they matter).</summary>
public static class ApiExamples
{
    public const string MemberCheck = """
        {
          "mark": "W3",
          "section": { "designation": "L70x70x6", "doubleAngle": { "gapMm": 10, "arrangement": "EqualLegs" } },
          "material": { "grade": "S355JR" },
          "lengths": { "lxMm": 2400, "lyMm": 2400, "kx": 1, "ky": 1 },
          "connectors": { "intermediateCount": 1 },
          "forces": { "tensionN": 0, "compressionN": 85000 }
        }
        """;

    public static IReadOnlyDictionary<string, string> Requests { get; } = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["CheckMember"] = MemberCheck,
        ["AnalyseTruss"] = """
            {
              "nodes": [ { "label": "A", "xMm": 0, "yMm": 0 }, { "label": "B", "xMm": 4000, "yMm": 0 }, { "label": "C", "xMm": 2000, "yMm": 1500 } ],
              "members": [ { "mark": "AB", "start": "A", "end": "B" }, { "mark": "AC", "start": "A", "end": "C" }, { "mark": "BC", "start": "B", "end": "C" } ],
              "supports": [ { "node": "A", "kind": "Pin" }, { "node": "B", "kind": "RollerX" } ],
              "loads": [ { "node": "C", "fxN": 0, "fyN": -10000 } ],
              "defaultAreaMm2": 1000
            }
            """,
        ["CreateProject"] = """
            { "name": "Rietvlei Packhouse", "client": "Umzimvubu Fruit Co-op", "reference": "J-2041", "location": "Rietvlei",
              "revision": "A", "standardCode": "SANS 10162-1", "defaultGradeName": "S355JR" }
            """,
        ["UpdateProject"] = """
            { "settings": { "name": "Rietvlei Packhouse", "client": "Umzimvubu Fruit Co-op", "reference": "J-2041", "location": "Rietvlei",
              "revision": "B", "standardCode": "SANS 10162-1", "defaultGradeName": "S355JR" }, "version": 1 }
            """,
        ["CreateTruss"] = """
            { "name": "RT2", "type": "PitchedHowe", "spanMm": 12000, "pitchDegrees": 15, "apexHeightMm": null, "heelDepthMm": 300,
              "panelCount": 8, "spacingMm": 6000, "bottomRestraintEvery": 2 }
            """,
        ["SaveTrussSettings"] = """
            { "name": "RT2", "spacingMm": 6000, "purlinSpacingMm": 1500, "deflectionLimitRatio": 250, "connectionAllowanceFraction": 0.1, "notes": null, "version": 1 }
            """,
        ["SaveTrussNodes"] = """
            { "rows": [ { "id": null, "version": 0, "label": "X1", "xMm": 6000, "yMm": 800, "isPurlinPoint": false } ], "deleted": [] }
            """,
        ["SaveTrussMembers"] = """
            { "rows": [ { "id": null, "version": 0, "mark": "V9", "startNode": "B5", "endNode": "T5", "group": "Verticals" } ], "deleted": [] }
            """,
        ["SaveTrussSupports"] = """
            [ { "nodeId": "00000000-0000-0000-0000-000000000001", "kind": "Pin", "version": 0 } ]
            """,
        ["SaveTrussGroups"] = """
            { "rows": [ { "id": null, "version": 0, "name": "Web posts", "role": "Vertical", "gradeName": "S355JR", "sectionDesignation": "L50x50x5",
              "limits": null, "doubleAngleGapMm": null, "orientation": null } ], "deleted": [] }
            """,
        ["SaveTrussActions"] = """
            { "coveringKPa": 0.1, "purlinsAndServicesKPa": 0.15, "imposedKPa": 0.25,
              "windCases": [ { "id": "W1", "name": "Uplift", "leftSlopeKPa": -0.6, "rightSlopeKPa": -0.4 } ], "version": 1 }
            """,
        ["SaveTrussCombinations"] = """
            { "rows": [ { "id": null, "version": 0, "name": "1.2D + 1.6L", "limitState": "Uls", "sortOrder": 10,
              "factors": [ { "key": "kind:Permanent", "label": "Permanent", "factor": 1.2 }, { "key": "kind:Imposed", "label": "Imposed", "factor": 1.6 } ] } ], "deleted": [] }
            """,
        ["UpdateMemberDesign"] = """
            { "overrides": { "sectionOverride": "L60x60x6", "kx": 1, "ky": 1, "kz": null, "lengthXMm": null, "lengthYMm": null, "lengthZMm": null,
              "kLuMm": null, "kLvMm": null, "connectorCount": null, "connectorSpacingMm": null, "useModifiedSlenderness": true }, "version": 2 }
            """,
        ["SubmitMember"] = """{ "checkerUserId": "<checker user id from /projects/{id}/people>", "note": "Ready for check" }""",
        ["SubmitTruss"] = """{ "checkerUserId": "<checker user id from /projects/{id}/people>", "note": "Whole truss ready" }""",
        ["ResubmitMember"] = """{ "answer": "Connector spacing reduced to 600 mm" }""",
        ["WithdrawMember"] = """{ "comment": "Taking it back to change the section" }""",
        ["ApproveMember"] = """{ "comment": "Checked against the record" }""",
        ["ReturnMember"] = """{ "comment": "Please check the out-of-plane length" }""",
        ["StartExport"] = """{ "kind": "MemberSummary", "format": "Xlsx" }""",
        ["StartFinalSet"] = """{ "kind": "CalculationBook", "format": "Pdf" }""",
        ["ReassignChecker"] = """{ "checkerUserId": "<user id of another checker>" }""",
    };
}
