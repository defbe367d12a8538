using SwitchTag.Store;
using SwitchTag.Store.Tests;

// The process the kill test ends with SIGKILL: stores one small interview, says so, then stores a
// large one (one long transaction) and says so. The test kills it during the second.
using var store = CollectionStore.Open(args[0]);
store.Save(Interviews.Small(), "small", "test", [], DateTimeOffset.UnixEpoch);
Console.WriteLine("saved small");
Console.Out.Flush();
store.Save(Interviews.Large(int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture)), "large", "test", [], DateTimeOffset.UnixEpoch);
Console.WriteLine("saved large");
