import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/**
 * Metering, stored results, idempotency and the shared rate-limit counters.
 * - usage_records: exactly one row per billable call, written in the transaction that stores its result.
 * - fit_results: every stored result (fits and other billable answers) for later retrieval and audit.
 * - idempotency_records: one row per (team, Idempotency-Key); the stored answer is replayed on retry.
 * - rate_limit_counters: fixed-window counters that every API process shares.
 * - request_log: one row per public API request (for the console's overview), success or not.
 */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.createTable('fit_results', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(32), allowNull: false },
    engine_version: { type: DataTypes.STRING(32), allowNull: false },
    input_hash: { type: DataTypes.STRING(64), allowNull: false },
    specification: { type: DataTypes.JSONB, allowNull: false },
    result: { type: DataTypes.JSONB, allowNull: false },
    model_snapshot: { type: DataTypes.JSONB, allowNull: true },
    request_id: { type: DataTypes.STRING(128), allowNull: false },
    api_key_id: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('fit_results', ['team_id', 'created_at'], { name: 'fit_results_team_created' });

  await queryInterface.createTable('usage_records', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    api_key_id: { type: DataTypes.STRING(64), allowNull: true },
    endpoint: { type: DataTypes.STRING(64), allowNull: false },
    observations: { type: DataTypes.BIGINT, allowNull: false },
    units: { type: DataTypes.INTEGER, allowNull: false },
    request_id: { type: DataTypes.STRING(128), allowNull: false, unique: true },
    result_id: { type: DataTypes.UUID, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('usage_records', ['team_id', 'created_at'], { name: 'usage_records_team_created' });

  await queryInterface.createTable('idempotency_records', {
    team_id: { type: DataTypes.UUID, allowNull: false, primaryKey: true, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    idempotency_key: { type: DataTypes.STRING(255), allowNull: false, primaryKey: true },
    request_fingerprint: { type: DataTypes.STRING(64), allowNull: false },
    state: { type: DataTypes.STRING(16), allowNull: false },
    response_status: { type: DataTypes.INTEGER, allowNull: true },
    response_body: { type: DataTypes.JSONB, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    expires_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable('rate_limit_counters', {
    counter_key: { type: DataTypes.STRING(255), primaryKey: true },
    hits: { type: DataTypes.INTEGER, allowNull: false },
    window_ends_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable('request_log', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    api_key_id: { type: DataTypes.STRING(64), allowNull: true },
    method: { type: DataTypes.STRING(8), allowNull: false },
    route: { type: DataTypes.STRING(128), allowNull: false },
    status: { type: DataTypes.INTEGER, allowNull: false },
    duration_ms: { type: DataTypes.DOUBLE, allowNull: false },
    request_id: { type: DataTypes.STRING(128), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('request_log', ['team_id', 'created_at'], { name: 'request_log_team_created' });
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('request_log');
  await queryInterface.dropTable('rate_limit_counters');
  await queryInterface.dropTable('idempotency_records');
  await queryInterface.dropTable('usage_records');
  await queryInterface.dropTable('fit_results');
}
