import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/** The per-team audit log. A bigint identity gives a stable, gap-tolerant order for cursor pages. */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    team_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'teams', key: 'id' },
      onDelete: 'CASCADE',
    },
    action: { type: DataTypes.STRING(64), allowNull: false },
    actor_user_id: {
      type: DataTypes.UUID,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    // A copy of the actor's e-mail at the time, so the log still reads well after the account is gone.
    actor_email: { type: DataTypes.STRING(320), allowNull: true },
    actor_key_id: { type: DataTypes.UUID, allowNull: true },
    target_type: { type: DataTypes.STRING(32), allowNull: true },
    target_id: { type: DataTypes.STRING(64), allowNull: true },
    details: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    ip_address: { type: DataTypes.STRING(64), allowNull: true },
    occurred_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('audit_events', ['team_id', 'id']);
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('audit_events');
}
