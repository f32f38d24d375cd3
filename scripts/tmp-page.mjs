import { chromium } from 'playwright-core';
const base = 'http://127.0.0.1:3000';
const b = await chromium.launch({ executablePath: '/usr/bin/chromium' });
const p = await b.newPage({ viewport: { width: 1400, height: 1000 } });
await p.goto(base + '/sign-in');
await p.getByLabel(/e-mail/i).pressSequentially(process.env.WHO ?? 'executive@kestrelbay.example');
await p.getByLabel(/password/i).pressSequentially('leeway-demo-2026');
await p.keyboard.press('Enter');
await p.waitForURL((u) => !u.pathname.includes('sign-in'), { timeout: 60000 });
await p.goto(base + (process.env.PAGE ?? '/portfolio'));
await p.waitForLoadState('networkidle');
for (const n of (process.env.CHECK ?? '').split(',').filter(Boolean)) { await p.getByRole('checkbox').nth(Number(n)).click(); await p.waitForTimeout(1500); }
await p.waitForTimeout(process.env.CHECK ? 4000 : 0);
if (process.env.TAB) { await p.getByRole('tab', { name: new RegExp(process.env.TAB) }).click(); await p.waitForTimeout(3000); }
await p.screenshot({ path: process.env.OUT ?? '/tmp/page.png', fullPage: true });
console.log(p.url());
await b.close();
