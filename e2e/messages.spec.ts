import { expect, freshPage, test } from './support/test';
import { BUYER, GROWER, signInAs, threeRoles } from './support/accounts';
import { waitForMail } from './support/mail-catcher';
import { paidPickupOrder } from './support/orders';

test('a buyer asks the grower about a lot from its page; the grower reads it in the inbox and answers', async ({ browser }) => {
  test.setTimeout(120_000);
  const question = `Can a semi reach the barn? (${Date.now().toString(36)})`;

  // A listed lot of the demo grower's farm (README: grower@ runs Larkspur Bend Farm).
  const buyerPage = await freshPage(browser);
  const listed = await (await buyerPage.request.get('/api/lots?pageSize=100')).json();
  const lot = (listed.items as { id: number; farmName: string }[]).find((l) => l.farmName === 'Larkspur Bend Farm')!;
  await signInAs(buyerPage, BUYER);
  await buyerPage.goto(`/hay/${lot.id}`);
  const ask = buyerPage.getByRole('region', { name: 'Ask the grower' });
  await ask.getByLabel('Your question').fill(question);
  await ask.getByRole('button', { name: 'Send to the grower' }).click();
  await expect(ask.getByRole('list', { name: 'Messages' })).toContainText(question);

  const growerPage = await freshPage(browser);
  await signInAs(growerPage, GROWER);
  await growerPage.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Messages' }).click();
  const conversation = growerPage.getByRole('list', { name: 'Conversations' }).getByRole('link').filter({ hasText: question });
  await conversation.first().click();
  await expect(growerPage.getByRole('list', { name: 'Messages' })).toContainText(question);
  await growerPage.getByLabel('Your answer').fill('Yes, the yard takes a 53 ft trailer.');
  await growerPage.getByRole('button', { name: 'Send' }).click();
  await expect(growerPage.getByRole('list', { name: 'Messages' })).toContainText('53 ft trailer');

  await buyerPage.reload();
  await expect(buyerPage.getByRole('region', { name: 'Ask the grower' })).toContainText('53 ft trailer');
});

test('buyer and grower write about a paid order on its page; each is told by e-mail; an admin reads along', async ({ browser }) => {
  test.setTimeout(180_000);
  const { buyer, grower, admin } = await threeRoles(browser);
  const order = await paidPickupOrder(buyer, grower);
  const question = `Can I come at 7 in the morning? (${Date.now().toString(36)})`;

  await buyer.goto(`/orders/${order.id}`);
  const buyerBox = buyer.getByRole('region', { name: 'Messages about this order' });
  await buyerBox.getByLabel('Write to the grower').fill(question);
  await buyerBox.getByRole('button', { name: 'Send' }).click();
  await expect(buyerBox.getByRole('list', { name: 'Messages' })).toContainText(question);

  // The grower's notice, as the mail catcher received it over SMTP, leads to the order's page.
  const notice = await waitForMail(GROWER.email, `The buyer wrote about order ${order.id}`);
  expect(notice.text).toContain(question);
  const link = /(https?:\/\/\S+\/orders\/\d+#messages)/.exec(notice.text)![1]!;
  expect(new URL(link).pathname).toBe(`/orders/${order.id}`);

  // The grower finds it from the inbox, with its unread count, and answers on the order's page.
  await grower.goto('/messages');
  const entry = grower.getByRole('list', { name: 'Conversations' }).getByRole('link').filter({ hasText: `Order ${order.id}` });
  await expect(entry).toContainText('1 new');
  await grower.goto(`/orders/${order.id}`);
  const growerBox = grower.getByRole('region', { name: 'Messages about this order' });
  await expect(growerBox.getByRole('list', { name: 'Messages' })).toContainText(question);
  await growerBox.getByLabel('Write to the buyer').fill('Yes, 7 is fine; the gate is open from 6.');
  await growerBox.getByRole('button', { name: 'Send' }).click();
  await expect(growerBox.getByRole('list', { name: 'Messages' })).toContainText('gate is open from 6');

  const answer = await waitForMail(BUYER.email, `The grower wrote about order ${order.id}`);
  expect(answer.text).toContain('gate is open from 6');
  await buyer.reload();
  await expect(buyer.getByRole('region', { name: 'Messages about this order' }).getByRole('list', { name: 'Messages' })).toContainText('gate is open from 6');

  // An admin reads the conversation on the order page but has nowhere to write.
  await admin.goto(`/orders/${order.id}`);
  const adminBox = admin.getByRole('region', { name: 'Messages about this order' });
  await expect(adminBox.getByRole('list', { name: 'Messages' })).toContainText(question);
  await expect(adminBox.getByRole('textbox')).toHaveCount(0);
});
