import type { Transaction } from 'sequelize';

import type { Role } from '@polecourt/contracts';

import { recordAudit } from '../../components/audit/record-audit.js';
import { productLineRepository } from '../../components/product-lines/repository.js';
import { userRepository } from '../../components/users/repository.js';
import { hashPassword } from '../../lib/password.js';

// An invented company: Tarnwell Motion Works, maker of small motion products.
export const DEMO_PASSWORD = 'polecourt-demo';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@example.com', name: 'Ines Okafor', role: 'admin' },
  { email: 'systems@example.com', name: 'Pavel Lindqvist', role: 'systems_engineer' },
  { email: 'controls@example.com', name: 'Mara Ettinger', role: 'controls_engineer' },
  { email: 'auditor@example.com', name: 'Tomasz Reyes', role: 'auditor' },
];

export const DEMO_PRODUCT_LINES = [
  {
    name: 'TG-4 gimbal pitch axis',
    description: 'Pitch axis of the TG-4 handheld camera gimbal: brushless direct drive, position loop around a rate loop.',
  },
  {
    name: 'VP-20 valve positioner',
    description: 'Electro-pneumatic positioner for 20 mm stroke control valves: stem position loop.',
  },
  {
    name: 'SD-7 spindle drive',
    description: 'Speed loop of the SD-7 7 kW machine-tool spindle drive.',
  },
];

export async function up(t: Transaction): Promise<void> {
  const hash = await hashPassword(DEMO_PASSWORD);
  const created = [];
  for (const u of DEMO_USERS) {
    const user = await userRepository.create({ ...u, passwordHash: hash }, t);
    created.push(user);
    await recordAudit(t, null, { action: 'user.create', entityType: 'user', entityId: user.id, after: { email: u.email, name: u.name, role: u.role, seeded: true } });
  }
  const systems = created.find((u) => u.role === 'systems_engineer')!;
  for (const pl of DEMO_PRODUCT_LINES) {
    const line = await productLineRepository.create({ ...pl, createdBy: systems.id }, t);
    await recordAudit(t, { id: systems.id, email: systems.email, name: systems.name, role: systems.role }, {
      action: 'product_line.create',
      entityType: 'product_line',
      entityId: line.id,
      productLineId: line.id,
      after: line,
    });
  }
}
