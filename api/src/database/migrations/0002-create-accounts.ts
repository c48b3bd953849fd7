import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/** Console accounts: users, server-side sessions, sign-in throttling and password-reset links. */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.createTable('users', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    // Stored trimmed and lower-cased, so the unique index also rejects case variants.
    email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
    display_name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    password_changed_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });

  await queryInterface.createTable('sessions', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    // SHA-256 of the cookie value: a copy of this table does not let anyone sign in.
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    user_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    ip_address: { type: DataTypes.STRING(64), allowNull: true },
    user_agent: { type: DataTypes.STRING(300), allowNull: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('sessions', ['user_id']);

  await queryInterface.createTable('sign_in_throttles', {
    // SHA-256 of the normalised e-mail: failures against unknown addresses are counted too (so the
    // lockout does not reveal which addresses have accounts) without storing those addresses.
    email_key: { type: DataTypes.CHAR(64), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    locked_until: { type: DataTypes.DATE, allowNull: true },
    last_failure_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });

  await queryInterface.createTable('password_resets', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    user_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    requested_from_ip: { type: DataTypes.STRING(64), allowNull: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.addIndex('password_resets', ['user_id']);
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('password_resets');
  await queryInterface.dropTable('sign_in_throttles');
  await queryInterface.dropTable('sessions');
  await queryInterface.dropTable('users');
}
