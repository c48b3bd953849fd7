import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/**
 * Datasets are immutable: one row per uploaded version, columns stored as binary chunks (little-endian
 * float64 for numeric columns with NaN for missing, a JSON array of strings for text columns). Deleting
 * is soft (deleted_at), so a fit's stored input hash stays auditable.
 */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.createTable('datasets', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(200), allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false },
    content_hash: { type: DataTypes.STRING(64), allowNull: false },
    row_count: { type: DataTypes.BIGINT, allowNull: false },
    byte_size: { type: DataTypes.BIGINT, allowNull: false },
    columns: { type: DataTypes.JSONB, allowNull: false },
    source: { type: DataTypes.STRING(16), allowNull: false },
    created_by: { type: DataTypes.STRING(200), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    deleted_at: { type: DataTypes.DATE, allowNull: true },
    deleted_by: { type: DataTypes.STRING(200), allowNull: true },
  });
  await queryInterface.addIndex('datasets', ['team_id', 'name', 'version'], { unique: true, name: 'datasets_team_name_version' });
  await queryInterface.addIndex('datasets', ['team_id', 'created_at', 'id'], { name: 'datasets_team_created' });
  await queryInterface.createTable('dataset_chunks', {
    dataset_id: { type: DataTypes.UUID, allowNull: false, primaryKey: true, references: { model: 'datasets', key: 'id' }, onDelete: 'CASCADE' },
    column_index: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
    chunk_index: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
    payload: { type: DataTypes.BLOB, allowNull: false },
  });
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('dataset_chunks');
  await queryInterface.dropTable('datasets');
}
