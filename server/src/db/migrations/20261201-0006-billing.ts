import { DataTypes, type ModelAttributeColumnOptions, type QueryInterface, type Sequelize } from 'sequelize';

/** Subscription state on the workspace, provider events seen (idempotency), workspace settings, suspension. */
export async function up(qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const add = (column: string, spec: ModelAttributeColumnOptions) => qi.addColumn('workspaces', column, spec, { transaction });
    await add('plan_id', { type: DataTypes.STRING(40), allowNull: true });
    await add('seats', { type: DataTypes.INTEGER, allowNull: true });
    await add('customer_id', { type: DataTypes.STRING(80), allowNull: true });
    await add('subscription_id', { type: DataTypes.STRING(80), allowNull: true });
    await add('subscription_item_id', { type: DataTypes.STRING(80), allowNull: true });
    await add('subscription_status', { type: DataTypes.STRING(20), allowNull: true });
    await add('cancel_at_period_end', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
    await add('current_period_end', { type: DataTypes.DATE, allowNull: true });
    await add('trial_ends_at', { type: DataTypes.DATE, allowNull: true });
    await add('card_brand', { type: DataTypes.STRING(20), allowNull: true });
    await add('card_last4', { type: DataTypes.STRING(4), allowNull: true });
    await add('card_exp_month', { type: DataTypes.INTEGER, allowNull: true });
    await add('card_exp_year', { type: DataTypes.INTEGER, allowNull: true });
    await add('past_due_since', { type: DataTypes.DATE, allowNull: true });
    await add('billing_event_at', { type: DataTypes.DATE, allowNull: true });
    await add('suspended_reason', { type: DataTypes.STRING(500), allowNull: true });
    await add('settings', { type: DataTypes.JSONB, allowNull: false, defaultValue: {} });
    await add('last_activity_at', { type: DataTypes.DATE, allowNull: true });
    await qi.addIndex('workspaces', ['customer_id'], { transaction });
    await qi.createTable(
      'billing_events',
      {
        id: { type: DataTypes.STRING(80), primaryKey: true, allowNull: false },
        type: { type: DataTypes.STRING(80), allowNull: false },
        workspace_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'workspaces', key: 'id' }, onDelete: 'SET NULL' },
        provider_created_at: { type: DataTypes.DATE, allowNull: false },
        applied: { type: DataTypes.BOOLEAN, allowNull: false },
        received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('billing_events');
  for (const c of [
    'plan_id',
    'seats',
    'customer_id',
    'subscription_id',
    'subscription_item_id',
    'subscription_status',
    'cancel_at_period_end',
    'current_period_end',
    'trial_ends_at',
    'card_brand',
    'card_last4',
    'card_exp_month',
    'card_exp_year',
    'past_due_since',
    'billing_event_at',
    'suspended_reason',
    'settings',
    'last_activity_at',
  ]) {
    await qi.removeColumn('workspaces', c);
  }
}
