import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/** Team membership with one role each, e-mailed invitations, and the team switch for developer keys. */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.addColumn('teams', 'developer_keys_allowed', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });

  await queryInterface.createTable('team_memberships', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    team_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'teams', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    role: { type: DataTypes.STRING(16), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addConstraint('team_memberships', {
    type: 'unique',
    fields: ['team_id', 'user_id'],
    name: 'team_memberships_team_user_unique',
  });
  await queryInterface.addConstraint('team_memberships', {
    type: 'check',
    fields: ['role'],
    where: { role: ['owner', 'admin', 'developer', 'billing'] },
    name: 'team_memberships_role_check',
  });
  await queryInterface.addIndex('team_memberships', ['user_id']);
  // Exactly one owner per team is a rule of the service; the partial unique index makes two impossible.
  await queryInterface.sequelize.query(
    `CREATE UNIQUE INDEX team_memberships_one_owner ON team_memberships (team_id) WHERE role = 'owner'`,
  );

  await queryInterface.createTable('team_invitations', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    team_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'teams', key: 'id' },
      onDelete: 'CASCADE',
    },
    email: { type: DataTypes.STRING(320), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invited_by_user_id: {
      type: DataTypes.UUID,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    accepted_by_user_id: {
      type: DataTypes.UUID,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('team_invitations', ['team_id']);
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('team_invitations');
  await queryInterface.dropTable('team_memberships');
  await queryInterface.removeColumn('teams', 'developer_keys_allowed');
}
