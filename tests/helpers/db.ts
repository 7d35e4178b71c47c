// Direct database access for tests that build their own world (the same models the app uses).
import { randomUUID } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { Bin, initModels, Part, Scale, TestWeight, User } from '../../models';
import { createSequelize } from '../../models/sequelize';
import type { Role } from '../../lib/roles';
import { hashPassword } from '../../server/auth/passwords';

let db: Sequelize | undefined;

export function testDb(): Sequelize {
  if (!db) {
    db = createSequelize({
      host: process.env.DB_HOST ?? '127.0.0.1',
      port: Number(process.env.DB_PORT ?? 3308),
      database: process.env.DB_NAME ?? 'tallyforge_test',
      username: process.env.DB_USER ?? 'tallyforge',
      password: process.env.DB_PASSWORD ?? '',
      poolMax: 5,
    });
    initModels(db);
  }
  return db;
}

export const TEST_PASSWORD = 'correct horse battery';
let cachedHash: Promise<string> | undefined;

export function unique(prefix: string): string {
  return `${prefix}-${randomUUID().slice(0, 8)}`;
}

// A signed-up user with a unique e-mail; the password is TEST_PASSWORD.
export async function createUser(role: Role, overrides: Partial<{ name: string; active: boolean; email: string }> = {}): Promise<User> {
  testDb();
  cachedHash ??= hashPassword(TEST_PASSWORD);
  return User.create({
    email: overrides.email ?? `${unique(role)}@example.test`,
    name: overrides.name ?? `Test ${role}`,
    role,
    passwordHash: await cachedHash,
    active: overrides.active ?? true,
  });
}

// A class III bench scale, 6 kg × 0.1 g with 1 g verification interval unless told otherwise (grams).
export async function createScale(
  overrides: Partial<{
    name: string;
    capacityG: number;
    divisionG: number;
    eG: number;
    repeatabilityG: number | null;
    status: 'in_service' | 'due' | 'locked';
  }> = {},
): Promise<Scale> {
  testDb();
  const e = overrides.eG ?? 1;
  return Scale.create({
    name: overrides.name ?? unique('scale'),
    location: 'test bench',
    capacityG: String(overrides.capacityG ?? 6000),
    minLoadG: String(20 * e),
    divisionG: String(overrides.divisionG ?? 0.1),
    verificationIntervalG: String(e),
    accuracyClass: 'III',
    repeatabilityG: overrides.repeatabilityG === undefined ? '0.05' : overrides.repeatabilityG === null ? null : String(overrides.repeatabilityG),
    connection: { kind: 'simulator', settleMs: 250, driftPerMinute: 0, rateHz: 20 },
    status: overrides.status ?? 'in_service',
    statusReason: overrides.status === 'locked' ? 'failed its weighing test' : null,
    calibrationDueAt: null,
  });
}

export async function createPart(
  overrides: Partial<{ partNumber: string; pieceSpread: number | null; countingMethod: 'scale' | 'hand'; apwG: number }> = {},
): Promise<Part> {
  testDb();
  return Part.create({
    partNumber: overrides.partNumber ?? unique('P').toUpperCase(),
    description: 'Test part',
    countingMethod: overrides.countingMethod ?? 'scale',
    apwG: overrides.apwG === undefined ? null : String(overrides.apwG),
    apwSampleSize: overrides.apwG === undefined ? null : 10,
    pieceSpread: overrides.pieceSpread === undefined || overrides.pieceSpread === null ? null : String(overrides.pieceSpread),
    // A spread given here stands for one learned well: from 100 pieces put on one at a time.
    ...(overrides.pieceSpread == null ? {} : { spreadScatter: overrides.pieceSpread ** 2, spreadNoise: 0, spreadDof: 99, spreadObservations: 100 }),
    photoFile: null,
  });
}

// A bin holding `quantity` of the part, with part_stock kept in step as the app does.
export async function stockPart(partId: number, quantity: number): Promise<Bin> {
  const db = testDb();
  return db.transaction(async (transaction) => {
    const letter = () => String.fromCharCode(65 + Math.floor(Math.random() * 26));
    const two = () => String(1 + Math.floor(Math.random() * 99)).padStart(2, '0');
    const code = `${letter()}${letter()}-${two()}-${1 + Math.floor(Math.random() * 9)}-${two()}`;
    const bin = await Bin.create({ code, partId, containerId: null, bookQuantity: quantity, lastCountedAt: null }, { transaction });
    await db.query('INSERT INTO part_stock (part_id, on_hand, reserved) VALUES (?, ?, 0) ON DUPLICATE KEY UPDATE on_hand = on_hand + VALUES(on_hand)', {
      replacements: [partId, quantity],
      transaction,
    });
    return bin;
  });
}

// A certified test weight (nominal in grams) of an OIML R 111 class.
export async function createTestWeight(
  nominalG: number,
  weightClass: 'E2' | 'F1' | 'F2' | 'M1' | 'M2' | 'M3' = 'F1',
  dueAt: string | null = null,
): Promise<TestWeight> {
  testDb();
  return TestWeight.create({
    identifier: unique(`TW-${weightClass}-${nominalG}G`).toUpperCase(),
    nominalG: String(nominalG),
    weightClass,
    certificateNumber: 'CAL-TEST',
    certificateFile: null,
    dueAt,
  });
}
