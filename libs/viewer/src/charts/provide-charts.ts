import type { Provider } from '@angular/core';
import { provideEchartsCore } from 'ngx-echarts';

/**
 * Provides the charts (ngx-echarts with a tree-shaken echarts core) to a screen. echarts itself is
 * loaded on first use, in its own chunk, and draws SVG unless a chart asks otherwise. Put it in a
 * lazily loaded component's `providers`.
 */
export function provideCharts(): Provider {
  return provideEchartsCore({
    echarts: () =>
      import('./echarts-setup').then(({ echarts }) => ({
        ...echarts,
        init: (dom: HTMLElement, theme?: string | object | null, opts?: Parameters<typeof echarts.init>[2]) =>
          echarts.init(dom, theme, { renderer: 'svg', ...opts }),
      })),
  });
}
