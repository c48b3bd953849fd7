import { Column, DataType, Model, Table } from 'sequelize-typescript';

@Table({ tableName: 'sign_in_throttles', underscored: true, timestamps: false })
export class SignInThrottle extends Model {
  @Column({ type: DataType.CHAR(64), primaryKey: true, field: 'email_key' })
  declare emailKey: string;

  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 0 })
  declare failures: number;

  @Column({ type: DataType.DATE, allowNull: true, field: 'locked_until' })
  declare lockedUntil: Date | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'last_failure_at' })
  declare lastFailureAt: Date;
}
