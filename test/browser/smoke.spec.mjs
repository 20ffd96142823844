// The built page loads and shows the demo scenario's totals (the runner fails it on any page error).
export const tests = [
  {
    name: 'the built page opens on the demo scenario',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      const rain = await page.getByLabel('Rainfall depth').first().textContent();
      if (!rain || !rain.includes('41.6')) throw new Error(`rainfall shown as ${rain}`);
    },
  },
];
