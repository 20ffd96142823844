// The built page loads and shows the demo scenario's totals with no page errors.
export const tests = [
  {
    name: 'the built page opens on the demo scenario',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      const errors = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(baseUrl);
      const rain = await page.getByLabel('Rainfall depth').first().textContent();
      if (!rain || !rain.includes('41.6')) throw new Error(`rainfall shown as ${rain}`);
      if (errors.length) throw new Error(errors.join('; '));
    },
  },
];
