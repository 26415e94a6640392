import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import type { BudgetChoicesInput, BudgetOverrides, SentBudgetSnapshot } from '@/shared/schemas/budgets';
import { jobs } from './jobs';
import { members } from './members';
import { organizations } from './organizations';
import { users } from './users';

/**
 * One price of a firm's price book (lib/budget/price-catalogue names every key). `amount` is a whole number:
 * cents for money, basis points for a percentage, thousandths for a quantity. Every price keeps when it was
 * set and by whom.
 */
export const priceItems = sqliteTable(
  'price_items',
  {
    id: text('id').primaryKey(),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    key: text('key').notNull(),
    amount: integer('amount').notNull(),
    note: text('note').notNull(),
    setAt: text('set_at').notNull(),
    setBy: text('set_by')
      .notNull()
      .references(() => users.id),
  },
  (t) => [uniqueIndex('price_items_org_key').on(t.orgId, t.key)],
);

/** A firm's price book settings: how old a price may be before it shows as stale. */
export const priceBookSettings = sqliteTable('price_book_settings', {
  orgId: text('org_id')
    .primaryKey()
    .references(() => organizations.id, { onDelete: 'cascade' }),
  staleAfterDays: integer('stale_after_days').notNull(),
  updatedAt: text('updated_at').notNull(),
  updatedBy: text('updated_by').references(() => users.id),
});

/** The estimator's choices and line overrides for one member's budget. */
export const memberBudgets = sqliteTable('member_budgets', {
  memberId: text('member_id')
    .primaryKey()
    .references(() => members.id, { onDelete: 'cascade' }),
  orgId: text('org_id')
    .notNull()
    .references(() => organizations.id, { onDelete: 'cascade' }),
  choices: text('choices', { mode: 'json' }).$type<BudgetChoicesInput>().notNull(),
  overrides: text('overrides', { mode: 'json' }).$type<BudgetOverrides>().notNull(),
  updatedAt: text('updated_at').notNull(),
  updatedBy: text('updated_by')
    .notNull()
    .references(() => users.id),
});

/** A job budget as sent to a client: frozen, dated, never changed after. */
export const sentBudgets = sqliteTable(
  'sent_budgets',
  {
    id: text('id').primaryKey(),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    clientName: text('client_name').notNull(),
    snapshot: text('snapshot', { mode: 'json' }).$type<SentBudgetSnapshot>().notNull(),
    sentAt: text('sent_at').notNull(),
    sentBy: text('sent_by')
      .notNull()
      .references(() => users.id),
  },
  (t) => [index('sent_budgets_job').on(t.jobId, t.sentAt)],
);
