// A file whose arrays hold null entries is read, reported by validation, and never crashes the helpers.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.Core.Tests.Regression;

public class NullEntryRegressionTests
{
    [Fact]
    public void A_null_bus_entry_does_not_throw_from_the_network_helpers()
    {
        // Found by the reader property tests: {"buses": [null]} made IsPerUnitOnly throw.
        Network n = NetworkFile.Parse("{\"buses\": [null, {\"id\": \"B1\", \"kv\": 0}]}", "nulls.study.json");
        Assert.True(n.IsPerUnitOnly);
        Assert.Null(n.FindBus("missing"));
        Assert.True(NetworkValidator.Validate(n).HasErrors);
    }
}
