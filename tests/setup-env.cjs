process.env.TZ = 'UTC';
