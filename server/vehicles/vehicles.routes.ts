import { CreateVehicleInput, UpdateVehicleInput, type VehicleDetail, type VehiclesResponse } from '../../shared/schemas/vehicle.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { createVehicle, deleteVehicle, getVehicle, listVehicles, updateVehicle } from './vehicles.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/vehicles';

export const vehicleRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: VehiclesResponse = await listVehicles(deps.db, workspaceOf(req));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    handler: async (req, res) => {
      const input = CreateVehicleInput.parse(req.body);
      const body: VehicleDetail = unwrap(await createVehicle(deps.db, workspaceOf(req), userOf(req), input, deps.clock()));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: `${base}/:vehicleId`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: VehicleDetail = unwrap(await getVehicle(deps.db, workspaceOf(req), pathParam(req, 'vehicleId')));
      res.json(body);
    },
  },
  {
    method: 'patch',
    path: `${base}/:vehicleId`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = UpdateVehicleInput.parse(req.body);
      const body: VehicleDetail = unwrap(await updateVehicle(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'vehicleId'), input, deps.clock()));
      res.json(body);
    },
  },
  {
    method: 'delete',
    path: `${base}/:vehicleId`,
    access: 'engineer',
    handler: async (req, res) => {
      unwrap(await deleteVehicle(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'vehicleId'), deps.clock()));
      res.status(204).end();
    },
  },
];
