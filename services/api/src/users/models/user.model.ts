import type { Role } from '@tallyloom/core';
import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Chapter } from '../../chapters/models/chapter.model';
import type { Relation } from '../../common/models/relation';
import { Region } from '../../regions/models/region.model';

@Table({ tableName: 'users', underscored: true })
export class User extends Model {
  declare id: number;

  @Column({ type: DataType.STRING(254), allowNull: false })
  declare email: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  declare displayName: string;

  @Column({ type: DataType.STRING(100), allowNull: true })
  declare passwordHash: string | null;

  @Column({ type: DataType.STRING(32), allowNull: false })
  declare role: Role;

  @ForeignKey(() => Region)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare regionId: number | null;

  @BelongsTo(() => Region)
  declare region?: Relation<Region> | null;

  @ForeignKey(() => Chapter)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true })
  declare chapterId: number | null;

  @BelongsTo(() => Chapter)
  declare chapter?: Relation<Chapter> | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true })
  declare active: boolean;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 })
  declare failedAttempts: number;

  @Column({ type: DataType.DATE, allowNull: true })
  declare lockedUntil: Date | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare lastSignInAt: Date | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare invitedAt: Date | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare passwordChangedAt: Date | null;

  declare createdAt: Date;
}
