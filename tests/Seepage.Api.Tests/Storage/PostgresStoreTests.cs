using Seepage.Api.Storage;

namespace Seepage.Api.Tests.Storage;

/// <summary>The store contract on a PostgreSQL server (a schema of its own per test; skipped without a server).</summary>
[Trait("Category", "Slow")] // PostgreSQL server
public sealed class PostgresStoreTests : StoreContractTests
{
    private string? _schema, _connectionString;

    protected override Database CreateDatabase()
    {
        _connectionString = PostgresTestServer.NewSchema(out string schema);
        _schema = schema;
        return new PostgresDatabase(_connectionString);
    }

    protected override Database SecondHandle() => new PostgresDatabase(_connectionString!);

    protected override void DeleteDatabase()
    {
        if (_schema is not null) PostgresTestServer.DropSchema(_schema);
    }
}
