import type { Sequelize } from 'sequelize';

// Every model names itself (modelName): production builds minify class names, and Sequelize
// would otherwise register several models under the same one-letter name.
import { Audit } from './audit';
import { AuditItem } from './audit-item';
import { Bin } from './bin';
import { BinCount } from './bin-count';
import { BuildOrder } from './build-order';
import { BuildOrderLine } from './build-order-line';
import { CalibrationRecord } from './calibration-record';
import { Container } from './container';
import { CountEvent } from './count-event';
import { MailMessage } from './mail-message';
import { JobRun } from './job-run';
import { Kit } from './kit';
import { KitComponent } from './kit-component';
import { Part } from './part';
import { PartStock } from './part-stock';
import { PieceWeightSample } from './piece-weight-sample';
import { PrintJob } from './print-job';
import { RequestKey } from './request-key';
import { UserSession } from './user-session';
import { Scale } from './scale';
import { PasswordToken } from './password-token';
import { SignInThrottle } from './sign-in-throttle';
import { SiteSettings } from './site-settings';
import { StockMovement } from './stock-movement';
import { StockReservation } from './stock-reservation';
import { TestWeight } from './test-weight';
import { User } from './user';

export {
  Audit,
  AuditItem,
  Bin,
  BinCount,
  BuildOrder,
  BuildOrderLine,
  CalibrationRecord,
  Container,
  CountEvent,
  JobRun,
  Kit,
  KitComponent,
  MailMessage,
  Part,
  PartStock,
  PasswordToken,
  PieceWeightSample,
  PrintJob,
  RequestKey,
  UserSession,
  Scale,
  SignInThrottle,
  SiteSettings,
  StockMovement,
  StockReservation,
  TestWeight,
  User,
};

const initialised = new WeakSet<Sequelize>();

export function initModels(sequelize: Sequelize): void {
  if (initialised.has(sequelize)) return;
  const models = [
    User,
    UserSession,
    RequestKey,
    SiteSettings,
    PasswordToken,
    SignInThrottle,
    MailMessage,
    PrintJob,
    Scale,
    Container,
    Part,
    PieceWeightSample,
    CountEvent,
  ];
  const stockModels = [Bin, BinCount, PartStock, StockMovement, Kit, KitComponent, BuildOrder, BuildOrderLine, StockReservation];
  const qualityModels = [TestWeight, CalibrationRecord, JobRun, Audit, AuditItem];
  for (const model of [...models, ...stockModels, ...qualityModels]) {
    model.initModel(sequelize);
  }
  PasswordToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  UserSession.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  PieceWeightSample.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  PieceWeightSample.belongsTo(Scale, { foreignKey: 'scaleId', as: 'scale' });
  CountEvent.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  CountEvent.belongsTo(Scale, { foreignKey: 'scaleId', as: 'scale' });
  CountEvent.belongsTo(User, { foreignKey: 'operatorId', as: 'operator' });
  // The migrations hold these foreign keys; the models only need them for reading, so sync adds none.
  CountEvent.belongsTo(BuildOrderLine, { foreignKey: 'orderLineId', as: 'orderLine', constraints: false });
  CountEvent.belongsTo(Bin, { foreignKey: 'binId', as: 'bin', constraints: false });
  Bin.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  BinCount.belongsTo(Bin, { foreignKey: 'binId', as: 'bin' });
  BinCount.belongsTo(CountEvent, { foreignKey: 'countEventId', as: 'event' });
  Kit.hasMany(KitComponent, { foreignKey: 'kitId', as: 'components' });
  KitComponent.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  BuildOrder.belongsTo(Kit, { foreignKey: 'kitId', as: 'kit' });
  BuildOrder.hasMany(BuildOrderLine, { foreignKey: 'orderId', as: 'lines' });
  BuildOrderLine.belongsTo(BuildOrder, { foreignKey: 'orderId', as: 'order' });
  BuildOrderLine.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  CalibrationRecord.belongsTo(Scale, { foreignKey: 'scaleId', as: 'scale' });
  Audit.hasMany(AuditItem, { foreignKey: 'auditId', as: 'items' });
  AuditItem.belongsTo(CountEvent, { foreignKey: 'countEventId', as: 'event' });
  initialised.add(sequelize);
}
