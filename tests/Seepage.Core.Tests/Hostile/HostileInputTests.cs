using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using CsCheck;
using Seepage.Core.Imports;
using Seepage.Core.Sections;
using Seepage.Core.Studies;

namespace Seepage.Core.Tests.Hostile;

/// <summary>
/// Hostile input (issue 11): damaged sections from the four shipped sections, and spreadsheets with units in their
/// headers, prove that (1) reading and checking never throws (so the service never answers 5xx for them), (2) every
/// refusal names the member (a JSON pointer whose parent exists in the damaged document) or the cell, and (3) a
/// damaged section that is accepted, when the damage does not change what the section says (misspelt or unknown members,
/// other spellings of enumerated values, extension members), gives exactly the model of the undamaged section, so no
/// figure changes; an unknown member or enumerated value is always refused at its pointer. The number of cases is
/// <c>SEEPAGE_HOSTILE_CASES</c> (default 2,000; the nightly-style run uses 20,000, see DEVELOPERS.md).
/// </summary>
[Trait("Category", "Hostile")]
public class HostileInputTests
{
    private static readonly int Cases = int.TryParse(Environment.GetEnvironmentVariable("SEEPAGE_HOSTILE_CASES"), out int n) ? n : 2000;

    private static readonly string[] Files =
    [
        "design-example.section.json", "examples/twin-pile-weir.section.json", "examples/cofferdam-sheet-pile.section.json",
        "examples/spillway-slab-drain.section.json",
    ];

    private static readonly string[] Texts = Files.Select(f => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, f))).ToArray();

    private static readonly string[] Models = Texts.Select(t => Fingerprint(SectionValidator.Validate(SectionParser.Parse(t, out _)!).Model!)).ToArray();

    [Trait("Category", "Slow")] // fuzzer
    [Fact]
    public void ParseAndValidate_DamagedSections_NeverThrowNameTheMemberAndNeverChangeTheModelSilently()
    {
        int accepted = 0, refused = 0, unchanged = 0;
        Gen.Select(Gen.Int[0, Files.Length - 1], Gen.Int, Gen.Int[1, 3]).Sample((file, seed, count) =>
        {
            var root = (JsonObject)JsonNode.Parse(Texts[file])!;
            var damage = new SectionDamage(new Random(seed));
            for (int k = 0; k < count; k++) damage.Apply(root);
            string text = Regex.Replace(root.ToJsonString(), "\"__raw__([^\"]*)\"", "$1");
            string about = $"{Files[file]}: {string.Join("; ", damage.Applied)}";

            var doc = SectionParser.Parse(text, out var parseProblems);
            var outcome = doc is null ? null : SectionValidator.Validate(doc);
            var problems = outcome?.Problems ?? parseProblems;
            JsonNode? damaged = TryParse(text);
            foreach (var p in problems)
            {
                if (p.Pointer.Length == 0 && p.Message.Contains("vertices", StringComparison.Ordinal)) continue; // a whole-section limit
                Assert.True(p.Pointer.Length > 0 && Names(damaged, p.Pointer), $"{about}\nproblem without a member: '{p.Pointer}' {p.Message}");
                Assert.DoesNotContain("System.", p.Message);
            }
            // A later damage may have removed the member again (deleted its parent): only what is still there counts.
            bool readable = !problems.Any(p => p.Message.Contains("is not valid JSON", StringComparison.Ordinal)); // e.g. nested too deep
            var notUnderstood = damage.MustRefuseAt.Where(p => readable && JsonPointer.Get(damaged, p) is not null && SectionContract.CheckPointer(p) is not null)
                // An enumerated value is checked by the validator, which runs once the document reads.
                .Concat(damage.UnknownValues.Where(u => doc is not null && JsonPointer.Get(damaged, u.Pointer) is JsonValue v
                    && v.GetValueKind() == System.Text.Json.JsonValueKind.String && v.GetValue<string>() == u.Value).Select(u => u.Pointer));
            foreach (string pointer in notUnderstood)
            {
                Assert.True(outcome is not { IsValid: true }, $"{about}\naccepted although {pointer} is not understood");
                // At the member, or at an ancestor refused as a whole (an object where a number belongs).
                Assert.True(problems.Any(p => p.Pointer == pointer || p.Pointer.Length > 0 && pointer.StartsWith(p.Pointer + "/", StringComparison.Ordinal)),
                    $"{about}\nno problem at {pointer}: " +
                    string.Join("; ", problems.Select(p => $"{p.Pointer} {p.Message}")));
            }
            if (outcome is { IsValid: true })
            {
                accepted++;
                if (!damage.ChangesValues)
                {
                    Assert.True(Fingerprint(outcome.Model!) == Models[file], $"{about}\naccepted with a different model");
                    unchanged++;
                }
            }
            else refused++;
        }, iter: Cases, threads: 1);
        Assert.True(accepted > 0 && refused > 0 && unchanged > 0, $"accepted {accepted}, refused {refused}, unchanged {unchanged}");
    }

    [Fact]
    public void CheckPointer_MisspeltStudyChanges_RefusedAndContractPointersAccepted()
    {
        var root = (JsonObject)JsonNode.Parse(Texts[0])!;
        var pointers = new List<string>();
        void Walk(JsonNode? node, string at)
        {
            pointers.Add(at);
            if (node is JsonObject o) foreach (var (k, v) in o) Walk(v, $"{at}/{k}");
            else if (node is JsonArray a) for (int i = 0; i < a.Count; i++) Walk(a[i], $"{at}/{i}");
        }
        Walk(root, "");
        foreach (string p in pointers.Skip(1)) Assert.True(SectionContract.CheckPointer(p) is null, p);
        Gen.Int[1, pointers.Count - 1].Sample(i =>
        {
            var tokens = pointers[i].Split('/').Skip(1).ToList();
            int k = tokens.FindLastIndex(t => !t.All(char.IsAsciiDigit));
            if (k < 0) return;
            tokens[k] = tokens[k].ToUpperInvariant() == tokens[k] ? tokens[k] + "x" : tokens[k].ToUpperInvariant();
            Assert.NotNull(SectionContract.CheckPointer("/" + string.Join('/', tokens)));
        }, iter: Math.Max(200, Cases / 10), threads: 1);
    }

    private static readonly (string Unit, double? Factor)[] KUnits =
        [("m/s", 1), ("cm/s", 0.01), ("M/S", 1), ("m/day", 1 / 86_400.0), ("ft/day", 0.3048 / 86_400), ("ft/min", 0.3048 / 60),
         ("cm/sec", null), ("mm/s", null), ("m s-1", null), ("darcy", null), ("", 1), ("-", null)];

    private static readonly (string Unit, double? Factor)[] LengthUnits =
        [("m", 1), ("ft", 0.3048), ("FT", 0.3048), ("feet", null), ("mm", null), ("in", null), ("", 1)];

    [Fact]
    public void ReadCsv_HeaderUnits_HonouredOrRefusedAtTheHeaderCell()
    {
        var example = SectionParser.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, Files[1])), out _)!;
        var lines = SectionSpreadsheet.WriteCsv(example).Split("\r\n");
        int soils = Array.IndexOf(lines, "soils") + 1, zones = Array.IndexOf(lines, "zone vertices") + 1;
        Gen.Select(Gen.Int[0, KUnits.Length - 1], Gen.Int[0, LengthUnits.Length - 1], Gen.Bool).Sample((ki, li, brackets) =>
        {
            var (k, kf) = KUnits[ki];
            var (l, lf) = LengthUnits[li];
            string Wrap(string u) => u.Length == 0 ? "" : brackets ? $" [{u}]" : $" ({u})";
            var edited = (string[])lines.Clone();
            edited[soils] = edited[soils].Replace("kx (m/s)", "kx" + Wrap(k));
            edited[zones] = edited[zones].Replace("x (m)", "x" + Wrap(l));
            var import = SectionSpreadsheet.ReadCsv(string.Join("\r\n", edited));
            string about = $"kx{Wrap(k)}, x{Wrap(l)}";
            if (kf is null || lf is null)
            {
                Assert.Null(import.Document);
                Assert.All(import.Problems, p => Assert.True(p.Row == soils + 1 || p.Row == zones + 1, $"{about}: {p.Location} {p.Message}"));
                Assert.Equal((kf is null ? 1 : 0) + (lf is null ? 1 : 0), import.Problems.Count);
                return;
            }
            Assert.True(import.Problems.Count == 0, about + ": " + string.Join("; ", import.Problems.Select(p => p.Message)));
            Assert.Equal(example.Soils![0].Kx!.Value * kf.Value, import.Document!.Soils![0].Kx!.Value, 1e-15);
            Assert.Equal(example.Zones![0].Outline![1][0] * lf.Value, import.Document.Zones![0].Outline![1][0], 1e-9);
        }, iter: Math.Max(200, Cases / 10), threads: 1);
    }

    // The model as JSON: the section as analysed, its values used, and the derived numbers the pipeline reads.
    private static string Fingerprint(SectionModel m) =>
        SectionParser.Write(m.Analysed! with { Extra = null }) + "|" +
        string.Join(";", m.Soils.Select(s => $"{s.Id}:{s.Kx:R}:{s.Ky:R}:{s.CreepClass}")) + "|" + m.WaterUnitWeight.ToString("R");

    private static JsonNode? TryParse(string text)
    {
        try { return JsonNode.Parse(text); } catch (System.Text.Json.JsonException) { return null; }
    }

    // The pointer names a member of the damaged document: it, or its parent, exists there (a missing required member is
    // reported at its own name under an existing parent). A document that is not JSON is named at its position instead.
    private static bool Names(JsonNode? root, string pointer)
    {
        if (root is null) return true;
        if (JsonPointer.Get(root, pointer) is not null) return true;
        int cut = pointer.LastIndexOf('/');
        string parent = cut <= 0 ? "" : pointer[..cut];
        return parent.Length == 0 || JsonPointer.Get(root, parent) is not null;
    }
}
