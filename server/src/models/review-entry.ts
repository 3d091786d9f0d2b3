import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { ReviewEntry as ReviewEntryDto } from '@tumblewise/shared';
import type { User } from './user';

/** One entry of a variant's sign-off thread: a request, a comment or a decision. */
export class ReviewEntry extends Model<InferAttributes<ReviewEntry>, InferCreationAttributes<ReviewEntry>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare variantId: string;
  declare kind: ReviewEntryDto['kind'];
  declare authorId: string | null;
  declare reviewerId: string | null;
  declare body: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare author?: NonAttribute<User | null>;
  declare reviewer?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    ReviewEntry.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        variantId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        authorId: { type: DataTypes.UUID, allowNull: true },
        reviewerId: { type: DataTypes.UUID, allowNull: true },
        body: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'review_entries', updatedAt: false },
    );
  }

  toDto(): ReviewEntryDto {
    const who = (u?: User | null) => (u ? { id: u.id, name: u.name } : null);
    return {
      id: this.id,
      kind: this.kind,
      author: who(this.author),
      reviewer: who(this.reviewer),
      body: this.body,
      createdAt: this.createdAt.toISOString(),
    };
  }
}
