import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'mail_outbox', underscored: true, timestamps: true, updatedAt: false })
export class OutboxMessage extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @Column({ type: DataType.STRING(48), allowNull: false })
  declare template: string;

  @Column({ type: DataType.STRING(320), allowNull: false })
  declare recipient: string;

  @Column({ type: DataType.STRING(300), allowNull: false })
  declare subject: string;

  @Column({ type: DataType.TEXT, allowNull: false, field: 'text_body' })
  declare textBody: string;

  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 0 })
  declare attempts: number;

  @Column({ type: DataType.DATE, allowNull: false, field: 'next_attempt_at', defaultValue: DataType.NOW })
  declare nextAttemptAt: Date;

  @Column({ type: DataType.TEXT, allowNull: true, field: 'last_error' })
  declare lastError: string | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'sent_at' })
  declare sentAt: Date | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'abandoned_at' })
  declare abandonedAt: Date | null;

  declare createdAt: Date;
}
