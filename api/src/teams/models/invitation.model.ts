import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { TeamRole } from '../access/team-permissions';
import { Team } from './team.model';

@Table({ tableName: 'team_invitations', underscored: true, timestamps: true, updatedAt: false })
export class Invitation extends Model {
  @Column({ type: DataType.UUID, primaryKey: true, defaultValue: DataType.UUIDV4 })
  declare id: string;

  @ForeignKey(() => Team)
  @Column({ type: DataType.UUID, allowNull: false, field: 'team_id' })
  declare teamId: string;

  @Column({ type: DataType.STRING(320), allowNull: false })
  declare email: string;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare role: TeamRole;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'token_hash' })
  declare tokenHash: string;

  @Column({ type: DataType.UUID, allowNull: true, field: 'invited_by_user_id' })
  declare invitedByUserId: string | null;

  @Column({ type: DataType.DATE, allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE, allowNull: true, field: 'accepted_at' })
  declare acceptedAt: Date | null;

  @Column({ type: DataType.UUID, allowNull: true, field: 'accepted_by_user_id' })
  declare acceptedByUserId: string | null;

  @Column({ type: DataType.DATE, allowNull: true, field: 'revoked_at' })
  declare revokedAt: Date | null;

  @BelongsTo(() => Team)
  declare team?: Team;

  declare createdAt: Date;
}
