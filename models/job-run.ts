import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class JobRun extends Model<InferAttributes<JobRun>, InferCreationAttributes<JobRun>> {
  declare job: string;
  declare runKey: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    JobRun.init(
      {
        job: { type: DataTypes.STRING(60), primaryKey: true },
        runKey: { type: DataTypes.STRING(120), primaryKey: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, modelName: 'JobRun', tableName: 'job_runs', updatedAt: false },
    );
  }
}
