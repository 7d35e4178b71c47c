import type { Sequelize } from 'sequelize';
import { Container } from './container';
import { CountEvent } from './count-event';
import { MailMessage } from './mail-message';
import { Part } from './part';
import { PieceWeightSample } from './piece-weight-sample';
import { Scale } from './scale';
import { PasswordToken } from './password-token';
import { SignInThrottle } from './sign-in-throttle';
import { SiteSettings } from './site-settings';
import { User } from './user';

export { Container, CountEvent, MailMessage, Part, PasswordToken, PieceWeightSample, Scale, SignInThrottle, SiteSettings, User };

const initialised = new WeakSet<Sequelize>();

export function initModels(sequelize: Sequelize): void {
  if (initialised.has(sequelize)) return;
  for (const model of [User, SiteSettings, PasswordToken, SignInThrottle, MailMessage, Scale, Container, Part, PieceWeightSample, CountEvent]) {
    model.initModel(sequelize);
  }
  PasswordToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  PieceWeightSample.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  PieceWeightSample.belongsTo(Scale, { foreignKey: 'scaleId', as: 'scale' });
  CountEvent.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  CountEvent.belongsTo(Scale, { foreignKey: 'scaleId', as: 'scale' });
  CountEvent.belongsTo(User, { foreignKey: 'operatorId', as: 'operator' });
  initialised.add(sequelize);
}
