import { DataTypes } from 'sequelize';

// Column types shared by models and migrations, so both always agree. The lists an ENUM column takes live
// in lib/domain/ (models take them from there; each migration keeps the values it shipped with).
// Weights are grams; DECIMAL comes back from the driver as a string and is converted at the edge.
export const grams = () => DataTypes.DECIMAL(14, 6);
export const pieceWeight = () => DataTypes.DECIMAL(16, 9);
export const ratio = () => DataTypes.DECIMAL(10, 8);
