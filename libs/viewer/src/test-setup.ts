import { setupZonelessTestEnv } from 'jest-preset-angular/setup-env/zoneless';

setupZonelessTestEnv();

// jsdom has no canvas drawing: answer "no context" quietly instead of logging "not implemented"
// (the charts then measure text by their own estimate; the 3-D view's renderer is mocked per test).
HTMLCanvasElement.prototype.getContext = (() => null) as typeof HTMLCanvasElement.prototype.getContext;
