// The part of the `pg` driver the e2e helpers use (to create and drop a database per test app).
// The driver ships without type declarations; Sequelize uses it at run time on PostgreSQL.
declare module 'pg' {
  export interface QueryResult<Row = Record<string, unknown>> {
    rows: Row[];
    rowCount: number | null;
  }
  export class Client {
    constructor(config: { connectionString?: string });
    connect(): Promise<void>;
    query<Row = Record<string, unknown>>(text: string, values?: unknown[]): Promise<QueryResult<Row>>;
    end(): Promise<void>;
  }
}
