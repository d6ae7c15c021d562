// Every browser test starts the service and drives Chromium (about 2.5 min for the set): all of them are Slow, left
// out of the quick loop `dotnet test --filter "Category!=Slow"` and run by ./test.sh.
[assembly: AssemblyTrait("Category", "Slow")]
