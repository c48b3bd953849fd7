import { DataTypes, QueryInterface } from 'sequelize';
import { MigrationParams } from 'umzug';

/** Outgoing mail is written here first and delivered by a retry loop, so an SMTP outage loses nothing. */
export async function up({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.createTable('mail_outbox', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    template: { type: DataTypes.STRING(48), allowNull: false },
    recipient: { type: DataTypes.STRING(320), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    abandoned_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
  await queryInterface.sequelize.query(
    `CREATE INDEX mail_outbox_due ON mail_outbox (next_attempt_at) WHERE sent_at IS NULL AND abandoned_at IS NULL`,
  );
}

export async function down({ context: queryInterface }: MigrationParams<QueryInterface>) {
  await queryInterface.dropTable('mail_outbox');
}
