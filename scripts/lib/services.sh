#!/usr/bin/env bash
# Sourced: local fakes of hosted services (none needed yet). Each later service adds its start
# and stop here so `npm start` and `npm test` bring up the same set.
services_start() { :; }
services_stop() { :; }
