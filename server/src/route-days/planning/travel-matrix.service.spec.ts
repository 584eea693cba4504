import type { ConfigService } from '@nestjs/config';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { AppConfig } from '../../config/environment';
import { greatCircle, TravelMatrixService } from './travel-matrix.service';

const config = (routingUrl?: string) =>
  ({ get: (key: string) => (key === 'ROUTING_URL' ? routingUrl : undefined) }) as unknown as ConfigService<
    AppConfig,
    true
  >;

describe('TravelMatrixService', () => {
  const points = [
    { lat: 44.8, lon: -92.4 },
    { lat: 44.81, lon: -92.41 },
  ];
  const model = { circuity: 1.3, averageSpeedKmh: 40 };

  it('estimates by great-circle distance times the circuity, at the average speed', async () => {
    const sut = new TravelMatrixService(config());
    const matrix = await sut.matrix(points, model);
    // Haversine, R = 6371.0088 km (IUGG mean radius): 0.01 deg N and 0.01 deg W at 44.8 N is about 1.363 km.
    expect(matrix.km[0]![1]! / 1.3).toBeCloseTo(1.363, 2);
    expect(matrix.minutes[0]![1]).toBeCloseTo((matrix.km[0]![1]! / 40) * 60, 6);
    expect(matrix.km[1]![1]).toBe(0);
    expect(matrix.source).toBe('great-circle');
  });

  describe('with a routing service', () => {
    let server: http.Server;
    let requests: string[];
    let url: string;
    beforeAll(async () => {
      requests = [];
      server = http.createServer((req, res) => {
        requests.push(req.url ?? '');
        res.setHeader('content-type', 'application/json');
        res.end(
          JSON.stringify({
            code: 'Ok',
            durations: [
              [0, 120],
              [150, 0],
            ],
            distances: [
              [0, 1500],
              [1600, null],
            ],
          }),
        );
      });
      await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
      url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    });
    afterAll(() => new Promise((resolve) => server.close(resolve)));

    it('asks the table endpoint once per set of points and reads seconds and metres', async () => {
      const sut = new TravelMatrixService(config(url));
      const matrix = await sut.matrix(points, model);
      expect(requests[0]).toBe(
        '/table/v1/driving/-92.400000,44.800000;-92.410000,44.810000?annotations=duration,distance',
      );
      expect(matrix.minutes[0]![1]).toBe(2);
      expect(matrix.km[1]![0]).toBe(1.6);
      expect(matrix.km[1]![1]).toBe(1e6);
      await sut.matrix(points, model);
      expect(requests).toHaveLength(1);
    });

    it('says so plainly when the service is down', async () => {
      const sut = new TravelMatrixService(config('http://127.0.0.1:9'));
      await expect(sut.matrix(points, model)).rejects.toThrow(/routing service/);
    });
  });

  it('keeps the estimate symmetric', () => {
    const { km } = greatCircle(points, model);
    expect(km[0]![1]).toBe(km[1]![0]);
  });
});
