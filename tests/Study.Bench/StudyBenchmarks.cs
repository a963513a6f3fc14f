// Whole studies on the demo network: the bank choice over its five offers, by loss-load factor and by a year's profile.
using BenchmarkDotNet.Attributes;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Studies;

namespace Study.Bench;

[MemoryDiagnoser]
public class StudyBenchmarks
{
    private StudyCase demo = null!;
    private BankCandidates offers = null!;
    private LoadProfile year = null!;

    private static readonly BankChoiceRequest Request = new() { TransformerId = "CQ-T1", NoLoadRate = 6500, LoadRate = 1800, LossLoadFactor = 0.3 };

    [GlobalSetup]
    public void Setup()
    {
        demo = StudyCase.Open(Networks("harbour-estate.study.json"));
        offers = CandidatesFile.Read(Networks("harbour-estate-cold-quay.candidates.json"));
        year = ProfileFile.Read(Networks("harbour-estate-year.profile.csv"));
    }

    /// <summary>Each run opens the network afresh, so no compiled model is reused between runs.</summary>
    [Benchmark]
    public BankChoiceResult ChooseByLossLoadFactor() => StudyCase.Of(demo.Network).Choose(Request, offers);

    [Benchmark]
    public BankChoiceResult ChooseByYearProfile() => StudyCase.Of(demo.Network).Choose(Request with { LossLoadFactor = null }, offers, year);

    /// <summary>networks/ of the repository, found from the working directory upwards.</summary>
    private static string Networks(string file)
    {
        for (var dir = new DirectoryInfo(Directory.GetCurrentDirectory()); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "networks", file))) return Path.Combine(dir.FullName, "networks", file);
        throw new FileNotFoundException($"networks/{file} not found above {Directory.GetCurrentDirectory()}");
    }
}
