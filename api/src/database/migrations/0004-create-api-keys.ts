import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/** Public-API keys: only a peppered hash of the secret is kept; the full key is shown once. */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.createTable('api_keys', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    // The key id that is part of the key itself, so a request finds its row without a scan.
    public_id: { type: DataTypes.CHAR(12), allowNull: false, unique: true },
    team_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'teams', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING(100), allowNull: false },
    scopes: { type: DataTypes.ARRAY(DataTypes.STRING(32)), allowNull: false },
    secret_hash: { type: DataTypes.CHAR(64), allowNull: false },
    created_by_user_id: {
      type: DataTypes.UUID,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    // Set by rotation: the key keeps working until this instant, then is rejected as rotated out.
    retires_at: { type: DataTypes.DATE, allowNull: true },
    replaced_by_key_id: { type: DataTypes.UUID, allowNull: true },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    last_used_ip: { type: DataTypes.STRING(64), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('api_keys', ['team_id']);
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('api_keys');
}
