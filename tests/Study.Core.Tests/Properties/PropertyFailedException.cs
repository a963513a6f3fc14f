// The failure a property run reports: the seed, the case and the shrunk case are in the message.
namespace Study.Core.Tests.Properties;

/// <summary>A property found a counter-example; the message holds the seed and the shrunk case.</summary>
internal sealed class PropertyFailedException(string message, Exception inner) : Exception(message, inner);
