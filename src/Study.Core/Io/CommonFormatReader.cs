// Imports a case in the IEEE Common Format for exchange of solved load flow data (IEEE Working
// Group, 1973) as a per-unit network, keeping the solution printed with it.
using System.Globalization;
using Study.Core.Io.CommonFormat;
using Study.Core.Model;

namespace Study.Core.Io;

/// <summary>
/// Maps the cards of a Common Format case onto the model (README, Network files): buses keep their
/// numbers as ids, loads and shunts become elements of their own, bus types 2 and 3 become generators,
/// branches stay in system per unit. Every problem is an <see cref="InputException"/> at line and column.
/// </summary>
public static class CommonFormatReader
{
    /// <summary>The archive cases are North American: 60 Hz (the format does not say).</summary>
    private const double FrequencyHz = 60;

    public static Network Parse(string text, string? fileName)
    {
        CaseFile file = CaseFile.Read(text, fileName);
        double baseMva = file.Title.BaseMva;
        var lines = new Dictionary<string, int>();
        var buses = new List<Bus>();
        var loads = new List<Load>();
        var shunts = new List<Shunt>();
        var generators = new List<Generator>();
        var published = new List<PublishedBus>();
        var byNumber = new Dictionary<int, BusCard>();

        foreach (BusCard card in file.Buses)
        {
            if (!byNumber.TryAdd(card.Number, card))
                throw new InputException(
                    $"bus card: bus {card.Number} is already defined on line {byNumber[card.Number].Line}",
                    fileName, card.Line, BusCard.NumberField.First);
            string id = Id(card.Number);
            buses.Add(new Bus { Id = id, Kv = card.BaseKv, Name = card.Name, Zone = card.Zone });
            lines[SourceMap.Key(ElementFamily.Bus, id)] = card.Line;
            if (card.LoadMw != 0 || card.LoadMvar != 0)
            {
                loads.Add(new Load { Id = "L" + id, Bus = id, PMw = card.LoadMw, QMvar = card.LoadMvar });
                lines[SourceMap.Key(ElementFamily.LoadOrShunt, "L" + id)] = card.Line;
            }
            if (card.ShuntGPu != 0 || card.ShuntBPu != 0)
            {
                // Admittance in per unit at 1 pu voltage is power in per unit: B > 0 supplies Mvar.
                shunts.Add(new Shunt
                {
                    Id = "SH" + id, Bus = id,
                    PMw = ToMva(card.ShuntGPu, baseMva), QMvar = ToMva(card.ShuntBPu, baseMva),
                });
                lines[SourceMap.Key(ElementFamily.LoadOrShunt, "SH" + id)] = card.Line;
            }
            if (GeneratorAt(card, id) is Generator generator)
            {
                generators.Add(generator);
                lines[SourceMap.Key(ElementFamily.Source, generator.Id)] = card.Line;
            }
            published.Add(new PublishedBus
            {
                Id = id, VPu = card.FinalVPu, AngleDeg = card.FinalAngleDeg,
                PGenMw = card.GenMw, QGenMvar = card.GenMvar,
            });
        }

        var lineElements = new List<Line>();
        var transformers = new List<Transformer>();
        string[] ids = BranchIds.Assign(file.Branches);
        for (int i = 0; i < file.Branches.Count; i++)
        {
            BranchCard card = file.Branches[i];
            BusCard from = KnownBus(byNumber, card, card.TapBus, BranchCard.TapBusField, fileName);
            BusCard to = KnownBus(byNumber, card, card.ZBus, BranchCard.ZBusField, fileName);
            if (IsTransformer(card, from, to)) transformers.Add(TransformerOf(card, ids[i]));
            else lineElements.Add(LineOf(card, ids[i]));
            lines[SourceMap.Key(ElementFamily.Branch, ids[i])] = card.Line;
        }

        string name = file.Title.CaseId.Length > 0 ? file.Title.CaseId
            : fileName is null ? "" : Path.GetFileNameWithoutExtension(fileName);
        return new Network
        {
            Name = name,
            BaseMva = baseMva,
            FrequencyHz = FrequencyHz,
            Buses = buses,
            Generators = generators,
            Loads = loads,
            Shunts = shunts,
            Lines = lineElements,
            Transformers = transformers,
            PublishedSolution = new PublishedSolution
            {
                Source = fileName is null ? null : Path.GetFileName(fileName),
                Buses = published,
            },
            Source = new SourceMap(fileName, lines) { Notes = Notes(file, fileName) },
        };
    }

    /// <summary>What was skipped before the title card, so a wrong MVA base is never read in silence.</summary>
    private static IReadOnlyList<string> Notes(CaseFile file, string? fileName)
    {
        if (file.SkippedLines.Count == 0) return [];
        IReadOnlyList<int> skipped = file.SkippedLines;
        string which = skipped.Count == 1 ? $"line {skipped[0]}" : $"{skipped.Count} lines ({skipped[0]} to {skipped[^1]})";
        return [$"{fileName ?? "the case"}: {which} before the title card skipped; the title card (MVA base {file.Title.BaseMva.ToString(CultureInfo.InvariantCulture)}) " +
            "is the line just before BUS DATA FOLLOWS"];
    }

    private static string Id(int busNumber) => busNumber.ToString(CultureInfo.InvariantCulture);

    /// <summary>
    /// Type 3 is the slack and type 2 a PV generator even at 0 MW (synchronous condensers); a type 0
    /// or 1 bus with generation holds it as a PQ generator. Mvar limits 0 and 0 mean "none stated"
    /// (README, Network files); for type 1 those columns are voltage limits, so a PQ generator has none.
    /// </summary>
    private static Generator? GeneratorAt(BusCard card, string busId)
    {
        GeneratorMode? mode = card.Type switch
        {
            3 => GeneratorMode.Slack,
            2 => GeneratorMode.Pv,
            _ when card.GenMw != 0 || card.GenMvar != 0 => GeneratorMode.Pq,
            _ => null,
        };
        if (mode is null) return null;
        bool limitsStated = mode != GeneratorMode.Pq && (card.MaxLimit != 0 || card.MinLimit != 0);
        double vSet = card.DesiredVPu != 0 ? card.DesiredVPu : card.FinalVPu != 0 ? card.FinalVPu : 1.0;
        return new Generator
        {
            Id = "G" + busId,
            Bus = busId,
            Mode = mode.Value,
            PMw = card.GenMw,
            QMvar = card.GenMvar,
            VSet = vSet,
            // The slack bus's angle in the file is the reference angle of the published solution.
            AngleDeg = mode == GeneratorMode.Slack && card.FinalAngleDeg != 0 ? card.FinalAngleDeg : null,
            QMaxMvar = limitsStated ? card.MaxLimit : null,
            QMinMvar = limitsStated ? card.MinLimit : null,
        };
    }

    private static BusCard KnownBus(Dictionary<int, BusCard> byNumber, BranchCard card, int number, Field field, string? fileName) =>
        byNumber.TryGetValue(number, out BusCard? bus) ? bus
            : throw new InputException(
                $"branch card: '{field.Name}' {number} is not a bus of the BUS DATA section", fileName, card.Line, field.First);

    /// <summary>
    /// The archive files mark every branch type 0 and tell transformers by a turns ratio or phase
    /// angle; a branch joining two different stated base voltages is a transformer at ratio 1 too,
    /// since no line can join them.
    /// </summary>
    private static bool IsTransformer(BranchCard card, BusCard from, BusCard to) =>
        card.Type >= 1 || card.FinalRatio != 0 || card.FinalAngleDeg != 0
        || (from.BaseKv != 0 && to.BaseKv != 0 && from.BaseKv != to.BaseKv);

    private static Line LineOf(BranchCard card, string id) => new()
    {
        Id = id,
        From = Id(card.TapBus),
        To = Id(card.ZBus),
        Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = card.RPu, X = card.XPu, B = card.BPu },
        RatingMva = card.Rating1Mva != 0 ? card.Rating1Mva : null,
    };

    /// <summary>The ratio sits at the tap bus (the card's first bus), so that bus is the hv side.</summary>
    private static Transformer TransformerOf(BranchCard card, string id) => new()
    {
        Id = id,
        Hv = Id(card.TapBus),
        Lv = Id(card.ZBus),
        RPu = card.RPu,
        XPu = card.XPu,
        BPu = card.BPu != 0 ? card.BPu : null,
        Ratio = card.FinalRatio != 0 ? card.FinalRatio : 1.0,
        PhaseShiftDeg = card.FinalAngleDeg != 0 ? card.FinalAngleDeg : null,
        RatingMva = card.Rating1Mva != 0 ? card.Rating1Mva : null,
    };

    /// <summary>Per unit to MW or Mvar, through decimal so that 0.19 pu on 100 MVA is 19, not 19.000000000000004.</summary>
    private static double ToMva(double pu, double baseMva) =>
        Math.Abs(pu) < 1e12 && baseMva < 1e12 ? (double)((decimal)pu * (decimal)baseMva) : pu * baseMva;
}
