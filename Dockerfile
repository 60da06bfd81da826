# syntax=docker/dockerfile:1
# Node 24 (LTS until April 2028): Node 20 reached end of life in April 2026. The service itself also runs on 20.19+ and 22.
# Build stage: install all dependencies, compile TypeScript.
FROM node:24-bookworm-slim AS build
WORKDIR /app
COPY package.json package-lock.json tsconfig.json tsconfig.build.json ./
COPY src ./src
RUN npm ci --ignore-scripts && npx tsc -p tsconfig.build.json

# Runtime stage: production dependencies only, non-root.
FROM node:24-bookworm-slim AS runtime
# No OILSKIN_PORT/OILSKIN_HOST here: they would override the PORT/HOST a container platform sets
# (the service listens on OILSKIN_PORT, else PORT, else 8080; on OILSKIN_HOST, else HOST, else 0.0.0.0).
ENV NODE_ENV=production
WORKDIR /app
COPY package.json package-lock.json ./
RUN npm ci --omit=dev --ignore-scripts && npm cache clean --force
COPY --from=build /app/dist ./dist
COPY bin ./bin
USER node
EXPOSE 8080
HEALTHCHECK --interval=15s --timeout=3s --start-period=10s --retries=3 \
  CMD node -e "fetch('http://127.0.0.1:'+(process.env.OILSKIN_PORT||process.env.PORT||8080)+'/healthz').then(r=>process.exit(r.ok?0:1)).catch(()=>process.exit(1))"
STOPSIGNAL SIGTERM
# The main thread's heap is bounded (the solver threads have their own limits, OILSKIN_WORKER_MEMORY_MB): within it V8
# collects before its committed heap drifts, so the RSS stays flat while a sweep streams (bench/sweep.ts).
CMD ["node", "--max-old-space-size=384", "dist/src/api/server.js"]
