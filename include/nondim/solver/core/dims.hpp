#pragma once
/// \file dims.hpp
/// \brief Named dimensions of the quantities fluid, thermal, mass-transfer and electrical
/// work uses. Names follow ISO 80000 quantity names; each is defined from the base
/// dimensions so the identities of the SI Brochure (9th ed., table 4) hold by construction.

#include "dimension.hpp"

namespace nondim::dims {

// base dimensions (SI Brochure 9th ed., table 3)
inline constexpr dimension dimensionless{};
inline constexpr dimension length = make_base(base_dimension::length);
inline constexpr dimension mass = make_base(base_dimension::mass);
inline constexpr dimension time = make_base(base_dimension::time);
inline constexpr dimension current = make_base(base_dimension::current);
inline constexpr dimension temperature = make_base(base_dimension::temperature);
inline constexpr dimension amount = make_base(base_dimension::amount);
inline constexpr dimension luminous_intensity = make_base(base_dimension::luminous_intensity);

// space and time
inline constexpr dimension area = length * length;
inline constexpr dimension volume = area * length;
inline constexpr dimension wavenumber = dimensionless / length;
inline constexpr dimension frequency = dimensionless / time;
inline constexpr dimension angular_velocity = frequency;
inline constexpr dimension velocity = length / time;
inline constexpr dimension acceleration = velocity / time;
inline constexpr dimension angular_acceleration = frequency / time;
inline constexpr dimension volume_flow_rate = volume / time;
inline constexpr dimension specific_volume = volume / mass;

// mechanics
inline constexpr dimension density = mass / volume;
inline constexpr dimension mass_flow_rate = mass / time;
inline constexpr dimension mass_flux = mass_flow_rate / area;
inline constexpr dimension momentum = mass * velocity;
inline constexpr dimension force = mass * acceleration;
inline constexpr dimension pressure = force / area;
inline constexpr dimension stress = pressure;
inline constexpr dimension bulk_modulus = pressure;
inline constexpr dimension compressibility = dimensionless / pressure;
inline constexpr dimension energy = force * length;
inline constexpr dimension work = energy;
inline constexpr dimension heat = energy;
inline constexpr dimension torque = energy;
inline constexpr dimension angular_momentum = momentum * length;
inline constexpr dimension moment_of_inertia = mass * area;
inline constexpr dimension power = energy / time;
inline constexpr dimension surface_tension = force / length;
inline constexpr dimension stiffness = force / length;
inline constexpr dimension dynamic_viscosity = pressure * time;
inline constexpr dimension kinematic_viscosity = area / time;
inline constexpr dimension specific_energy = energy / mass;
inline constexpr dimension specific_enthalpy = specific_energy;
inline constexpr dimension energy_density = energy / volume;
inline constexpr dimension power_density = power / volume;
inline constexpr dimension gravitational_constant = volume / (mass * time * time);

// heat
inline constexpr dimension heat_flow_rate = power;
inline constexpr dimension heat_flux_density = power / area;
inline constexpr dimension heat_capacity = energy / temperature;
inline constexpr dimension entropy = heat_capacity;
inline constexpr dimension specific_heat_capacity = heat_capacity / mass;
inline constexpr dimension specific_entropy = specific_heat_capacity;
inline constexpr dimension specific_gas_constant = specific_heat_capacity;
inline constexpr dimension volumetric_heat_capacity = heat_capacity / volume;
inline constexpr dimension thermal_conductivity = power / (length * temperature);
inline constexpr dimension heat_transfer_coefficient = power / (area * temperature);
inline constexpr dimension thermal_resistance = temperature / power;
inline constexpr dimension thermal_insulance = area * temperature / power;
inline constexpr dimension thermal_diffusivity = area / time;
inline constexpr dimension thermal_expansion_coefficient = dimensionless / temperature;
inline constexpr dimension temperature_gradient = temperature / length;

// amount of substance and mass transfer
inline constexpr dimension molar_mass = mass / amount;
inline constexpr dimension molar_volume = volume / amount;
inline constexpr dimension amount_concentration = amount / volume;
inline constexpr dimension mass_concentration = mass / volume;
inline constexpr dimension molar_energy = energy / amount;
inline constexpr dimension molar_heat_capacity = heat_capacity / amount;
inline constexpr dimension molar_gas_constant = molar_heat_capacity;
inline constexpr dimension mass_diffusivity = area / time;
inline constexpr dimension mass_transfer_coefficient = velocity;
inline constexpr dimension molar_flux = amount / (area * time);
inline constexpr dimension catalytic_activity = amount / time;

// electromagnetism
inline constexpr dimension electric_charge = current * time;
inline constexpr dimension voltage = power / current;
inline constexpr dimension electric_field_strength = voltage / length;
inline constexpr dimension resistance = voltage / current;
inline constexpr dimension conductance = current / voltage;
inline constexpr dimension resistivity = resistance * length;
inline constexpr dimension electrical_conductivity = conductance / length;
inline constexpr dimension capacitance = electric_charge / voltage;
inline constexpr dimension inductance = voltage * time / current;
inline constexpr dimension magnetic_flux = voltage * time;
inline constexpr dimension magnetic_flux_density = magnetic_flux / area;
inline constexpr dimension magnetic_field_strength = current / length;
inline constexpr dimension current_density = current / area;
inline constexpr dimension charge_density = electric_charge / volume;
inline constexpr dimension permittivity = capacitance / length;
inline constexpr dimension permeability = inductance / length;

// light
inline constexpr dimension luminance = luminous_intensity / area;

}  // namespace nondim::dims
